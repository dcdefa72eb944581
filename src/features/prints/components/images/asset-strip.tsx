import clsx from 'clsx';
import { ASSET_VIEW_LABELS } from '@shared/domain/asset-views';
import type { AssetRecord } from '@shared/types/asset';

/** Thumbnails of every image of the print; choosing one shows it large. */
export function AssetStrip({
  assets,
  selectedId,
  onSelect,
}: {
  assets: AssetRecord[];
  selectedId: number | null;
  onSelect: (id: number) => void;
}) {
  return (
    <ul aria-label="Images of this print" className="flex gap-2 overflow-x-auto pb-1">
      {assets.map((asset) => (
        <li key={asset.id} className="shrink-0">
          <button
            type="button"
            aria-pressed={asset.id === selectedId}
            onClick={() => onSelect(asset.id)}
            className={clsx(
              'flex w-28 flex-col items-stretch rounded border bg-paper-deep p-1 text-left text-xs',
              asset.id === selectedId ? 'border-gall ring-2 ring-gall' : 'border-paper-edge',
            )}
          >
            <img
              src={asset.urls.thumbnail}
              alt=""
              className="h-20 w-full object-contain"
              loading="lazy"
            />
            <span className="mt-1 font-medium">{ASSET_VIEW_LABELS[asset.view]}</span>
            {asset.status === 'processing' && (
              <span className="flex items-center gap-1 text-ink-faint">
                <progress
                  max={100}
                  value={asset.progress}
                  aria-label={`Preparing ${ASSET_VIEW_LABELS[asset.view]}`}
                  className="h-1.5 w-14"
                />
                {asset.progress}%
              </span>
            )}
            {asset.status === 'failed' && <span className="text-alert">could not be prepared</span>}
          </button>
        </li>
      ))}
    </ul>
  );
}
