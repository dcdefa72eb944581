import { useWatch } from 'react-hook-form';
import type { AssetRecord } from '@shared/types/asset';
import { AreaMarker } from '@/components/catalogue/area-marker';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import type { RegistrarFormParts } from './types';

/**
 * Where a mark is seen on one of the print's photographs: choose the photograph, then drag
 * (or use the arrow keys) to mark the area. Only images that finished processing are offered.
 */
export function MarkRegion({
  index,
  photographs,
  control,
  setValue,
}: Pick<RegistrarFormParts, 'control' | 'setValue'> & {
  index: number;
  photographs: AssetRecord[];
}) {
  const assetId = useWatch({ control, name: `marks.${index}.assetId` });
  const area = useWatch({ control, name: `marks.${index}.area` });
  const ready = photographs.filter((asset) => asset.status === 'ready');
  const chosen = ready.find((asset) => asset.id === assetId);
  const n = index + 1;
  const set = { shouldDirty: true } as const;
  if (ready.length === 0) return null;
  return (
    <div className="flex min-w-0 flex-col gap-2 sm:col-span-2">
      <SelectField
        label="Seen on photograph"
        value={chosen ? String(chosen.id) : ''}
        options={[
          { value: '', label: 'No photograph' },
          ...ready.map((asset) => ({
            value: String(asset.id),
            label: `${asset.view}${asset.originalName ? ` (${asset.originalName})` : ''}`,
          })),
        ]}
        onChange={(event) => {
          const id = event.target.value ? Number(event.target.value) : null;
          setValue(`marks.${index}.assetId`, id, set);
          // An area belongs to the photograph it was drawn on.
          setValue(`marks.${index}.area`, null, set);
        }}
      />
      {chosen && (
        <>
          <AreaMarker
            src={chosen.urls.web}
            alt={`Photograph ${chosen.view} for mark ${n}`}
            area={area ?? null}
            onChange={(next) => setValue(`marks.${index}.area`, next, set)}
          />
          <div className="flex items-center gap-2 text-xs">
            <span className="text-ink-faint">
              {area ? 'Area marked.' : 'Drag on the photograph to mark where the mark is.'}
            </span>
            {area && (
              <Button onClick={() => setValue(`marks.${index}.area`, null, set)}>Clear area</Button>
            )}
          </div>
        </>
      )}
    </div>
  );
}
