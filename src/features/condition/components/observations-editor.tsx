import {
  useFieldArray,
  type Control,
  type FieldErrors,
  type UseFormRegister,
} from 'react-hook-form';
import { LOCATION_SUGGESTIONS, OBSERVATION_TERMS, SEVERITIES } from '@shared/domain/condition';
import type { ConditionReportCreate, ConditionReportCreateInput } from '@shared/schemas/condition';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';

type Props = {
  control: Control<ConditionReportCreateInput, unknown, ConditionReportCreate>;
  register: UseFormRegister<ConditionReportCreateInput>;
  errors: FieldErrors<ConditionReportCreateInput>;
};

const TERM_OPTIONS = OBSERVATION_TERMS.map((term) => ({ value: term, label: term }));
const SEVERITY_OPTIONS = SEVERITIES.map((severity) => ({ value: severity, label: severity }));

/** What was seen, where on the print, and how bad: one row each. */
export function ObservationsEditor({ control, register, errors }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: 'observations' });
  return (
    <fieldset className="space-y-2">
      <legend className="mb-1 text-lg font-serif">Observations</legend>
      <datalist id="observation-places">
        {LOCATION_SUGGESTIONS.map((place) => (
          <option key={place} value={place} />
        ))}
      </datalist>
      {fields.length === 0 && <p className="text-sm text-ink-faint">Nothing recorded yet.</p>}
      <ol className="space-y-2">
        {fields.map((field, index) => {
          const rowErrors = errors.observations?.[index];
          return (
            <li
              key={field.id}
              aria-label={`Observation ${index + 1}`}
              className="grid gap-2 rounded border border-paper-edge bg-white/60 p-2 sm:grid-cols-[1fr_1.4fr_1fr_auto] sm:items-end"
            >
              <SelectField
                label="Term"
                options={TERM_OPTIONS}
                error={rowErrors?.term?.message}
                {...register(`observations.${index}.term`)}
              />
              <TextField
                label="Where on the print"
                list="observation-places"
                error={rowErrors?.location?.message}
                {...register(`observations.${index}.location`)}
              />
              <SelectField
                label="Severity"
                options={SEVERITY_OPTIONS}
                error={rowErrors?.severity?.message}
                {...register(`observations.${index}.severity`)}
              />
              <Button
                tone="danger"
                onClick={() => remove(index)}
                aria-label={`Remove observation ${index + 1}`}
              >
                Remove
              </Button>
            </li>
          );
        })}
      </ol>
      <Button onClick={() => append({ term: 'silvering', location: '', severity: 'slight' })}>
        Add observation
      </Button>
    </fieldset>
  );
}
