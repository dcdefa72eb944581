import { lazy, Suspense, useState } from 'react';
import { ASSET_VIEW_LABELS } from '@shared/domain/asset-views';
import type { SampleRegionInput } from '@shared/schemas/asset';
import type { AssetRecord, SampleResult } from '@shared/types/asset';
import type { PrintView } from '@shared/types/catalogue';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/notices';
import { useCan } from '@/lib/session';
import { useDeleteAsset, useSampleRegion } from '../../api/assets';
import { AssetStrip } from './asset-strip';
import { CaptureDetails } from './capture-details';
import { useLinkedZoom } from './linked-zoom';
import { SamplePanel } from './sample-panel';
import { UploadPanel } from './upload-panel';

// OpenSeadragon is the largest part of the record page: load it only where images are.
const DeepZoom = lazy(() => import('./deep-zoom'));

const infoUrl = (asset: AssetRecord) => `${asset.urls.iiif}/info.json`;

/** The images of a print: deep zoom (recto and verso side by side), the other views, capture details, samples, uploads. */
export function PrintImages({ print }: { print: PrintView }) {
  const can = useCan();
  const assets = print.assets;
  const recto = assets.find((asset) => asset.view === 'recto');
  const verso = assets.find((asset) => asset.view === 'verso');
  const [chosenId, setChosenId] = useState<number | null>(null);
  const selected = assets.find((asset) => asset.id === chosenId) ?? recto ?? assets[0] ?? null;
  const pair = selected && recto && verso && (selected === recto || selected === verso);
  const linked = useLinkedZoom(Boolean(pair));
  const [sampling, setSampling] = useState(false);
  const [samples, setSamples] = useState<SampleResult[]>([]);
  const sample = useSampleRegion(selected?.id ?? 0);
  const remove = useDeleteAsset();

  const onRegion = sampling
    ? (region: SampleRegionInput) =>
        sample.mutate(region, { onSuccess: (result) => setSamples((list) => [...list, result]) })
    : undefined;
  const select = (id: number) => {
    setChosenId(id);
    setSamples([]);
    setSampling(false);
  };

  return (
    <section aria-labelledby="record-images" className="mb-8">
      <h2 id="record-images" className="mb-2 text-xl">
        Images
      </h2>
      {!selected && <p className="text-sm text-ink-faint">No images of this print yet.</p>}
      {selected && (
        <Suspense fallback={<Loading label="Opening the viewer…" />}>
          <div className={pair ? 'grid gap-2 md:grid-cols-2' : 'grid'}>
            {pair ? (
              <>
                <ViewerFor
                  asset={recto}
                  title={print.title}
                  onViewer={linked.first}
                  onRegion={selected === recto ? onRegion : undefined}
                />
                <ViewerFor
                  asset={verso}
                  title={print.title}
                  onViewer={linked.second}
                  onRegion={selected === verso ? onRegion : undefined}
                />
              </>
            ) : (
              <ViewerFor asset={selected} title={print.title} onRegion={onRegion} />
            )}
          </div>
        </Suspense>
      )}
      {pair && (
        <p className="mt-1 text-xs text-ink-faint">Recto and verso zoom and pan together.</p>
      )}
      {assets.length > 0 && (
        <div className="mt-3">
          <AssetStrip assets={assets} selectedId={selected?.id ?? null} onSelect={select} />
        </div>
      )}
      {selected && (
        <div className="mt-4 grid gap-4 lg:grid-cols-2">
          <section aria-labelledby="capture-title">
            <h3 id="capture-title" className="mb-1 text-lg">
              {ASSET_VIEW_LABELS[selected.view]}: capture
            </h3>
            <CaptureDetails asset={selected} canOriginal={can('originals:read')} />
            {can('prints:write') && (
              <Button
                tone="danger"
                className="mt-2"
                disabled={remove.isPending}
                onClick={() => remove.mutate(selected.id, { onSuccess: () => setChosenId(null) })}
              >
                Remove this image
              </Button>
            )}
          </section>
          {can('samples:write') && (
            <SamplePanel
              printId={print.id}
              asset={selected}
              samples={samples}
              sampling={sampling}
              onToggle={() => setSampling((on) => !on)}
              onClear={() => setSamples([])}
              canRecord={can('tone:write')}
              error={sample.error}
            />
          )}
        </div>
      )}
      {can('prints:write') && <UploadPanel printId={print.id} existing={assets.length} />}
    </section>
  );
}

function ViewerFor({
  asset,
  title,
  onViewer,
  onRegion,
}: {
  asset: AssetRecord;
  title: string;
  onViewer?: Parameters<typeof DeepZoom>[0]['onViewer'];
  onRegion?: (region: SampleRegionInput) => void;
}) {
  const label = `${ASSET_VIEW_LABELS[asset.view]} of ${title}`;
  if (asset.status !== 'ready') {
    return (
      <figure className="flex min-h-[22rem] flex-col items-center justify-center gap-2 bg-paper-deep p-4 text-sm">
        <img src={asset.urls.thumbnail} alt={label} className="max-h-64 object-contain" />
        <figcaption>
          {asset.status === 'failed' ? (
            <span className="text-alert">Deep zoom could not be prepared.</span>
          ) : (
            <>
              Preparing deep zoom…{' '}
              <progress max={100} value={asset.progress} aria-label={`Preparing ${label}`} />
            </>
          )}
        </figcaption>
      </figure>
    );
  }
  return (
    <div className="h-[26rem] md:h-[32rem]">
      <DeepZoom
        infoUrl={infoUrl(asset)}
        label={label}
        imageSize={{ width: asset.width, height: asset.height }}
        onViewer={onViewer}
        onRegion={onRegion}
      />
    </div>
  );
}
