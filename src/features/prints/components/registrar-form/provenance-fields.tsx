import { useFieldArray } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { DATE_HINT, legendClass, type RegistrarFormParts } from './types';

/** Earlier owners, oldest first: add, remove and move links of the chain. */
export function ProvenanceFields({ control, register, errors }: RegistrarFormParts) {
  const { fields, append, remove, move } = useFieldArray({ control, name: 'provenance' });
  return (
    <fieldset className="min-w-0 rounded border border-paper-edge p-3">
      <legend className={legendClass}>Earlier owners</legend>
      {fields.length === 0 && (
        <p className="mb-2 text-sm text-ink-faint">None recorded. Add them oldest first.</p>
      )}
      <ol className="flex flex-col gap-3">
        {fields.map((field, index) => {
          const problems = errors.provenance?.[index];
          const n = index + 1;
          return (
            <li
              key={field.id}
              aria-label={`Owner ${n}`}
              className="rounded border border-paper-edge bg-white/70 p-3"
            >
              <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
                <span className="font-serif text-lg">Owner {n}</span>
                <span className="flex gap-1">
                  <Button
                    aria-label={`Move owner ${n} up`}
                    disabled={index === 0}
                    onClick={() => move(index, index - 1)}
                  >
                    ↑
                  </Button>
                  <Button
                    aria-label={`Move owner ${n} down`}
                    disabled={index === fields.length - 1}
                    onClick={() => move(index, index + 1)}
                  >
                    ↓
                  </Button>
                  <Button
                    tone="danger"
                    aria-label={`Remove owner ${n}`}
                    onClick={() => remove(index)}
                  >
                    Remove
                  </Button>
                </span>
              </div>
              <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-4">
                <TextField
                  label="Owner"
                  {...register(`provenance.${index}.owner`)}
                  error={problems?.owner?.message}
                />
                <TextField
                  label="From"
                  placeholder="c. 1890"
                  autoComplete="off"
                  {...register(`provenance.${index}.from`)}
                  error={problems?.from?.message}
                />
                <TextField
                  label="To"
                  placeholder="1920s"
                  autoComplete="off"
                  {...register(`provenance.${index}.to`)}
                  error={problems?.to?.message}
                />
                <TextField
                  label="Evidence"
                  hint="What shows it: a letter, a sale catalogue, a stamp"
                  {...register(`provenance.${index}.evidence`)}
                  error={problems?.evidence?.message}
                />
              </div>
            </li>
          );
        })}
      </ol>
      <p className="mt-2 text-xs text-ink-faint">Dates: {DATE_HINT}; leave empty when unknown.</p>
      <Button className="mt-2" onClick={() => append({ owner: '' })}>
        + Add earlier owner
      </Button>
    </fieldset>
  );
}
