import {
  useFieldArray,
  type Control,
  type FieldErrors,
  type UseFormRegister,
  type UseFormSetValue,
} from 'react-hook-form';
import {
  LIGHT_SOURCE_SUGGESTIONS,
  METHOD_SUGGESTIONS,
  STAGE_LABELS,
  STAGES,
} from '@shared/domain/vocabulary';
import type { PrintCreate, PrintCreateInput } from '@shared/schemas/print';
import type { ProcessingStepInput } from '@shared/schemas/processing-step';
import type { SolutionBatchView } from '@shared/types/catalogue';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { asNumber } from './form-values';

type Form = {
  control: Control<PrintCreateInput, unknown, PrintCreate>;
  register: UseFormRegister<PrintCreateInput>;
  setValue: UseFormSetValue<PrintCreateInput>;
  errors: FieldErrors<PrintCreateInput>;
  batches: SolutionBatchView[];
};

const numeric = { setValueAs: asNumber };

type NumberKey = 'concentrationPercent' | 'coats' | 'minutes' | 'temperatureC';

const STAGE_OPTIONS = STAGES.map((stage) => ({ value: stage, label: STAGE_LABELS[stage] }));

/** The processing history as an ordered list: add, remove and move steps. */
export function StepsEditor({ control, register, setValue, errors, batches }: Form) {
  const { fields, append, remove, move } = useFieldArray({ control, name: 'processing' });
  const batchOptions = batches.map((batch) => ({
    value: batch.id,
    label: batchLabel(batch),
  }));
  /** Picking a batch fills the step's chemical and concentration from the batch record. */
  const fillFromBatch = (index: number, id: number) => {
    const batch = batches.find((candidate) => candidate.id === id);
    if (!batch) return;
    const options = { shouldDirty: true, shouldValidate: true };
    setValue(`processing.${index}.chemical`, batch.chemical, options);
    if (batch.concentrationPercent != null) {
      setValue(`processing.${index}.concentrationPercent`, batch.concentrationPercent, options);
    }
  };

  return (
    <fieldset className="rounded border border-paper-edge p-3">
      <legend className="px-1 font-serif text-xl">Processing history</legend>
      <datalist id="method-suggestions">
        {METHOD_SUGGESTIONS.map((method) => (
          <option key={method} value={method} />
        ))}
      </datalist>
      <datalist id="light-suggestions">
        {LIGHT_SOURCE_SUGGESTIONS.map((light) => (
          <option key={light} value={light} />
        ))}
      </datalist>
      {fields.length === 0 && (
        <p className="mb-2 text-sm text-ink-faint">
          No steps yet. Add them in the order they were done.
        </p>
      )}
      <ol className="flex flex-col gap-3">
        {fields.map((field, index) => {
          const stepErrors = errors.processing?.[index];
          const numberField = (key: NumberKey, label: string, step = 'any') => (
            // Text, not type="number": Chromium keeps only the "e" of "ten" in a number
            // input and reports it empty, so the slip could not be named.
            <TextField
              label={label}
              inputMode={step === '1' ? 'numeric' : 'decimal'}
              autoComplete="off"
              {...register(`processing.${index}.${key}`, numeric)}
              error={stepErrors?.[key]?.message}
            />
          );
          return (
            <li
              key={field.id}
              className="rounded border border-paper-edge bg-white/70 p-3"
              aria-label={`Step ${index + 1}`}
            >
              <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
                <span className="font-serif text-lg">Step {index + 1}</span>
                <span className="flex gap-1">
                  <Button
                    aria-label={`Move step ${index + 1} up`}
                    disabled={index === 0}
                    onClick={() => move(index, index - 1)}
                  >
                    ↑
                  </Button>
                  <Button
                    aria-label={`Move step ${index + 1} down`}
                    disabled={index === fields.length - 1}
                    onClick={() => move(index, index + 1)}
                  >
                    ↓
                  </Button>
                  <Button
                    tone="danger"
                    aria-label={`Remove step ${index + 1}`}
                    onClick={() => remove(index)}
                  >
                    Remove
                  </Button>
                </span>
              </div>
              <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-4">
                <SelectField
                  label="Stage"
                  placeholder={`Choose (usually ${STAGE_LABELS[usualStage(index)].toLowerCase()} here)`}
                  options={STAGE_OPTIONS}
                  {...register(`processing.${index}.stage`)}
                  error={stepErrors?.stage?.message}
                />
                <TextField
                  label="Chemical"
                  {...register(`processing.${index}.chemical`)}
                  error={stepErrors?.chemical?.message}
                />
                {numberField('concentrationPercent', 'Concentration (% w/v)')}
                <SelectField
                  label="Solution batch"
                  placeholder="None"
                  options={batchOptions}
                  {...register(`processing.${index}.solutionBatchId`, {
                    ...numeric,
                    onChange: (event) => fillFromBatch(index, Number(event.target.value)),
                  })}
                  error={stepErrors?.solutionBatchId?.message}
                />
                <TextField
                  label="Method"
                  list="method-suggestions"
                  {...register(`processing.${index}.method`)}
                  error={stepErrors?.method?.message}
                />
                <TextField
                  label="Light source"
                  list="light-suggestions"
                  {...register(`processing.${index}.lightSource`)}
                  error={stepErrors?.lightSource?.message}
                />
                {numberField('coats', 'Coats', '1')}
                {numberField('minutes', 'Minutes')}
                {numberField('temperatureC', 'Temperature (°C)')}
                <TextField
                  label="Notes"
                  className="sm:col-span-2 lg:col-span-3"
                  {...register(`processing.${index}.notes`)}
                  error={stepErrors?.notes?.message}
                />
              </div>
            </li>
          );
        })}
      </ol>
      <Button className="mt-3" onClick={() => append(newStep())}>
        + Add step
      </Button>
    </fieldset>
  );
}

/** "FIX-25A · sodium thiosulfate 10 %", with the exhausted date when there is one. */
function batchLabel(batch: SolutionBatchView): string {
  const strength = batch.concentrationPercent != null ? ` ${batch.concentrationPercent} %` : '';
  const exhausted = batch.exhaustedOn ? ` — exhausted on ${batch.exhaustedOn}` : '';
  return `${batch.code} · ${batch.chemical}${strength}${exhausted}`;
}

/**
 * A new step starts with no stage: a step nobody looked at must not be saved as a real stage
 * (it was pre-filled with the usual next one, so an untouched step became "Salting"). Saving
 * it empty is refused with "Choose a stage" beside it (`ProcessingStepSchema`).
 */
function newStep(): ProcessingStepInput {
  // The form holds what the person chose; the schema, not the type, says a stage is needed.
  return { stage: '' as ProcessingStepInput['stage'] };
}

/** The usual salt-print order (common practice), named in the empty stage's prompt. */
const USUAL_ORDER = [
  'salting',
  'sensitizing',
  'exposure',
  'prewash',
  'fixing',
  'washing',
  'drying',
] as const;
function usualStage(index: number): (typeof STAGES)[number] {
  return USUAL_ORDER[index] ?? 'other';
}
