import { Controller, type Control } from 'react-hook-form';
import type { TreatmentCreate, TreatmentCreateInput } from '@shared/schemas/condition';
import type { PrintView } from '@shared/types/catalogue';

const STAGES = [
  { name: 'beforeAssetIds', label: 'Before' },
  { name: 'afterAssetIds', label: 'After' },
] as const;

/** Which of the print's photographs show it before and after the treatment. */
export function TreatmentImages({
  print,
  control,
}: {
  print: PrintView;
  control: Control<TreatmentCreateInput, unknown, TreatmentCreate>;
}) {
  if (print.assets.length === 0) {
    return (
      <p className="text-sm text-ink-faint">
        Add before and after photographs to the record to link them to this treatment.
      </p>
    );
  }
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      {STAGES.map((stage) => (
        <Controller
          key={stage.name}
          control={control}
          name={stage.name}
          render={({ field }) => {
            const ids: number[] = field.value ?? [];
            return (
              <fieldset>
                <legend className="mb-1 font-serif text-lg">{stage.label}</legend>
                <ul className="flex flex-wrap gap-2">
                  {print.assets.map((asset) => (
                    <li key={asset.id}>
                      <label className="flex flex-col items-center gap-1 text-xs">
                        <img src={asset.urls.thumbnail} alt="" className="h-20" />
                        <span>
                          <input
                            type="checkbox"
                            checked={ids.includes(asset.id)}
                            onChange={(event) =>
                              field.onChange(
                                event.target.checked
                                  ? [...ids, asset.id]
                                  : ids.filter((id) => id !== asset.id),
                              )
                            }
                          />{' '}
                          {stage.label}: {asset.view} #{asset.id}
                        </span>
                      </label>
                    </li>
                  ))}
                </ul>
              </fieldset>
            );
          }}
        />
      ))}
    </div>
  );
}
