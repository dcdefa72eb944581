import { Controller, type Control } from 'react-hook-form';
import type {
  ConditionReportCreate,
  ConditionReportCreateInput,
  ImageArea,
} from '@shared/schemas/condition';
import type { PrintView } from '@shared/types/catalogue';
import { Button } from '@/components/ui/button';
import { AreaMarker } from '@/components/catalogue/area-marker';

type Attached = { assetId: number; area?: ImageArea | null; caption?: string | null };

/** Photographs of the print to attach; on each, drag to mark the area the report speaks of. */
export function ImageAttachments({
  print,
  control,
}: {
  print: PrintView;
  control: Control<ConditionReportCreateInput, unknown, ConditionReportCreate>;
}) {
  if (print.assets.length === 0) {
    return (
      <p className="text-sm text-ink-faint">
        This print has no photographs yet; add them to the record to attach them here.
      </p>
    );
  }
  return (
    <Controller
      control={control}
      name="images"
      render={({ field }) => {
        const attached: Attached[] = field.value ?? [];
        const find = (id: number) => attached.find((image) => image.assetId === id);
        const update = (id: number, change: Partial<Attached> | null) =>
          field.onChange(
            change === null
              ? attached.filter((image) => image.assetId !== id)
              : find(id)
                ? attached.map((image) => (image.assetId === id ? { ...image, ...change } : image))
                : [...attached, { assetId: id, area: null, caption: null, ...change }],
          );
        return (
          <fieldset>
            <legend className="mb-1 font-serif text-lg">Photographs</legend>
            <p className="mb-2 text-sm text-ink-soft">
              Tick the photographs to attach; drag on one to mark the area concerned.
            </p>
            <ul className="grid gap-3 sm:grid-cols-2">
              {print.assets.map((asset) => {
                const image = find(asset.id);
                const label = `${asset.view} ${asset.originalName ?? `#${asset.id}`}`;
                return (
                  <li key={asset.id} className="rounded border border-paper-edge bg-white/60 p-2">
                    <label className="flex items-center gap-2 text-sm">
                      <input
                        type="checkbox"
                        checked={Boolean(image)}
                        onChange={(event) => update(asset.id, event.target.checked ? {} : null)}
                      />
                      Attach {label}
                    </label>
                    {image ? (
                      <div className="mt-2 space-y-1">
                        <AreaMarker
                          src={asset.urls.web}
                          alt={`Photograph ${label}`}
                          area={image.area ?? null}
                          onChange={(area) => update(asset.id, { area })}
                        />
                        <div className="flex items-center gap-2 text-xs">
                          <span className="text-ink-faint">
                            {image.area ? 'Area marked.' : 'No area marked.'}
                          </span>
                          {image.area && (
                            <Button onClick={() => update(asset.id, { area: null })}>
                              Clear area
                            </Button>
                          )}
                        </div>
                        <input
                          aria-label={`Caption for ${label}`}
                          placeholder="Caption"
                          value={image.caption ?? ''}
                          onChange={(event) => update(asset.id, { caption: event.target.value })}
                          className="w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm"
                        />
                      </div>
                    ) : (
                      <img
                        src={asset.urls.thumbnail}
                        alt={`Photograph ${label}`}
                        className="mt-2 max-h-32"
                      />
                    )}
                  </li>
                );
              })}
            </ul>
          </fieldset>
        );
      }}
    />
  );
}
