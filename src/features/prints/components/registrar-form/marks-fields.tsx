import type { AssetRecord } from '@shared/types/asset';
import { useFieldArray } from 'react-hook-form';
import { MARK_KINDS, MARK_POSITIONS } from '@shared/domain/registrar/vocabulary';
import { Button } from '@/components/ui/button';
import { SelectField, TextArea } from '@/components/ui/field';
import { MarkRegion } from './mark-region';
import { legendClass, type RegistrarFormParts } from './types';

const POSITION_OPTIONS = MARK_POSITIONS.map((p) => ({ value: p, label: p }));
const KIND_OPTIONS = MARK_KINDS.map((k) => ({ value: k, label: k }));

/**
 * Marks and inscriptions: where, what kind, the words as written and a reading, and where
 * the mark is seen on one of the print's photographs (once it has some).
 */
export function MarksFields({
  control,
  register,
  setValue,
  errors,
  photographs,
}: RegistrarFormParts & { photographs: AssetRecord[] }) {
  const { fields, append, remove } = useFieldArray({ control, name: 'marks' });
  return (
    <fieldset className="min-w-0 rounded border border-paper-edge p-3">
      <legend className={legendClass}>Marks and inscriptions</legend>
      {fields.length === 0 && <p className="mb-2 text-sm text-ink-faint">None recorded.</p>}
      <ol className="flex flex-col gap-3">
        {fields.map((field, index) => {
          const problems = errors.marks?.[index];
          const n = index + 1;
          return (
            <li
              key={field.id}
              aria-label={`Mark ${n}`}
              className="rounded border border-paper-edge bg-white/70 p-3"
            >
              <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
                <span className="font-serif text-lg">Mark {n}</span>
                <Button tone="danger" aria-label={`Remove mark ${n}`} onClick={() => remove(index)}>
                  Remove
                </Button>
              </div>
              <div className="grid gap-2 sm:grid-cols-2">
                <SelectField
                  label="Where"
                  options={POSITION_OPTIONS}
                  {...register(`marks.${index}.position`)}
                  error={problems?.position?.message}
                />
                <SelectField
                  label="Kind"
                  options={KIND_OPTIONS}
                  {...register(`marks.${index}.kind`)}
                  error={problems?.kind?.message}
                />
                <TextArea
                  label="Transcription"
                  rows={2}
                  hint="As written, spelling and line breaks kept"
                  {...register(`marks.${index}.transcription`)}
                  error={problems?.transcription?.message}
                />
                <TextArea
                  label="Reading or translation"
                  rows={2}
                  {...register(`marks.${index}.reading`)}
                  error={problems?.reading?.message}
                />
                <label className="flex items-center gap-2 text-sm sm:col-span-2">
                  <input type="checkbox" {...register(`marks.${index}.private`)} />
                  Private (seen only by archivists and admins, not searched by viewers)
                </label>
                <MarkRegion
                  index={index}
                  photographs={photographs}
                  control={control}
                  setValue={setValue}
                />
                {problems?.assetId?.message && (
                  <p className="text-xs text-alert sm:col-span-2">{problems.assetId.message}</p>
                )}
              </div>
            </li>
          );
        })}
      </ol>
      <Button
        className="mt-3"
        onClick={() => append({ position: 'verso', kind: 'pencil inscription', transcription: '' })}
      >
        + Add mark
      </Button>
    </fieldset>
  );
}
