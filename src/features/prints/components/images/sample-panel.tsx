import { useState } from 'react';
import { todayIso } from '@shared/domain/tone/check-date';
import type { AssetRecord, SampleResult } from '@shared/types/asset';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notices';
import { useRecordToneCheck } from '../../api/assets';

const PATCHES = ['dmax', 'mid', 'highlight', 'dmin'] as const;

const swatch = ({ r, g, b }: SampleResult['rgb']) => `rgb(${r} ${g} ${b})`;

/**
 * Samples drawn on the viewer, each named as a tone-check patch; a conservator can send
 * them as a scan-based tone check dated by the scan's capture date.
 */
export function SamplePanel({
  printId,
  asset,
  samples,
  sampling,
  onToggle,
  onClear,
  canRecord,
  error,
}: {
  printId: number;
  asset: AssetRecord;
  samples: SampleResult[];
  sampling: boolean;
  onToggle: () => void;
  onClear: () => void;
  canRecord: boolean;
  error: unknown;
}) {
  const [patches, setPatches] = useState<Record<number, string>>({});
  const record = useRecordToneCheck(printId);
  const checkedOn = asset.exif.capturedAt?.slice(0, 10) ?? todayIso();

  return (
    <section aria-labelledby="sample-title" className="mt-4 rounded border border-paper-edge p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="sample-title" className="text-lg">
          Colour samples
        </h3>
        <Button aria-pressed={sampling} tone={sampling ? 'primary' : 'quiet'} onClick={onToggle}>
          {sampling ? 'Drawing: drag on the image' : 'Sample a region'}
        </Button>
      </div>
      <p className="mt-1 text-xs text-ink-soft">
        Lab from a scan is only as good as the scanner’s calibration and a reference target scanned
        with the print. Treat it as a comparison between scans from the same, profiled scanner, not
        as a spectrophotometer reading.
      </p>
      <ErrorNotice error={error} className="mt-2" />
      {samples.length > 0 && (
        <table className="mt-2 w-full text-sm">
          <caption className="sr-only">Samples from {asset.view}</caption>
          <thead className="text-left text-ink-faint">
            <tr>
              <th scope="col">Colour</th>
              <th scope="col">L*</th>
              <th scope="col">a*</th>
              <th scope="col">b*</th>
              <th scope="col">Region (px)</th>
              {canRecord && <th scope="col">Patch</th>}
            </tr>
          </thead>
          <tbody>
            {samples.map((sample, i) => (
              <tr key={i}>
                <td>
                  <span
                    className="inline-block h-4 w-8 rounded border border-paper-edge align-middle"
                    style={{ background: swatch(sample.rgb) }}
                    title={`sRGB ${sample.rgb.r}, ${sample.rgb.g}, ${sample.rgb.b}`}
                  />
                </td>
                <td>{sample.lab.L.toFixed(1)}</td>
                <td>{sample.lab.a.toFixed(1)}</td>
                <td>{sample.lab.b.toFixed(1)}</td>
                <td className="text-xs text-ink-faint">
                  {sample.region.width}×{sample.region.height} at {sample.region.x},
                  {sample.region.y}
                </td>
                {canRecord && (
                  <td>
                    <select
                      aria-label={`Patch of sample ${i + 1}`}
                      value={patches[i] ?? ''}
                      onChange={(event) => setPatches({ ...patches, [i]: event.target.value })}
                      className="rounded border border-paper-edge bg-paper px-1 py-0.5"
                    >
                      <option value="">—</option>
                      {PATCHES.map((patch) => (
                        <option key={patch}>{patch}</option>
                      ))}
                    </select>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {samples.length > 0 && (
        <div className="mt-2 flex flex-wrap gap-2">
          {canRecord && (
            <Button
              tone="primary"
              disabled={record.isPending || !Object.values(patches).some(Boolean)}
              onClick={() =>
                record.mutate({
                  checkedOn,
                  method: 'scan',
                  instrument: asset.exif.device,
                  illuminant: 'D50',
                  observer: '2',
                  baseline: false,
                  readings: samples
                    .map((sample, i) => ({ patch: patches[i] ?? '', ...sample.lab }))
                    .filter((reading) => reading.patch),
                })
              }
            >
              Record as a tone check on {checkedOn}
            </Button>
          )}
          <Button onClick={onClear}>Clear samples</Button>
        </div>
      )}
      {record.isSuccess && (
        <p role="status" className="mt-2 text-sm">
          Tone check recorded.
        </p>
      )}
      <ErrorNotice error={record.error} className="mt-2" />
    </section>
  );
}
