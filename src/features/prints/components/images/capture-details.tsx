import { formatDateTime, formatFileSize, formatNumber } from '@shared/domain/format';
import type { AssetRecord } from '@shared/types/asset';

/** What the file says about its capture, and its fixity record. */
export function CaptureDetails({
  asset,
  canOriginal,
}: {
  asset: AssetRecord;
  canOriginal: boolean;
}) {
  const { exif } = asset;
  const rows: Array<[string, string]> = [
    ['Captured', exif.capturedAt ? formatDateTime(exif.capturedAt) : '—'],
    ['Device', exif.device ?? '—'],
    ['Software', exif.software ?? '—'],
    ['Resolution', exif.dpi ? `${exif.dpi} dpi` : '—'],
    ['Colour profile', exif.iccProfile ?? 'none (taken as sRGB)'],
    ['Pixels', `${formatNumber(asset.width)} × ${formatNumber(asset.height)}`],
    ['Bit depth', `${exif.bitDepth} bits per channel, ${exif.channels} channel(s)`],
    ['File', `${exif.format.toUpperCase()}, ${formatFileSize(asset.bytes)}`],
    ['SHA-256', asset.sha256],
    [
      'Fixity',
      asset.fixity
        ? `${asset.fixity.result === 'ok' ? 'intact' : asset.fixity.result} at ${formatDateTime(asset.fixity.checkedAt)}`
        : 'not checked yet',
    ],
  ];
  return (
    <div>
      <dl className="grid grid-cols-[8rem_1fr] gap-x-3 gap-y-1 text-sm">
        {rows.map(([label, value]) => (
          <div key={label} className="contents">
            <dt className="text-ink-faint">{label}</dt>
            <dd className={label === 'SHA-256' ? 'font-mono text-xs break-all' : undefined}>
              {label === 'Fixity' && asset.fixity && asset.fixity.result !== 'ok' ? (
                <strong className="text-alert">{value}</strong>
              ) : (
                value
              )}
            </dd>
          </div>
        ))}
      </dl>
      {canOriginal && (
        <a className="mt-2 inline-block text-sm" href={asset.urls.original} download>
          Download the original ({formatFileSize(asset.bytes)})
        </a>
      )}
    </div>
  );
}
