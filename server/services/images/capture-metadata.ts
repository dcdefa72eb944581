import exifr from 'exifr';
import type { CaptureMetadata } from '../../../shared/types/asset';
import type { ProbedImage } from './probe';

type Tags = Record<string, unknown>;

const text = (value: unknown): string | null =>
  typeof value === 'string' && value.trim() ? value.trim() : null;

/** EXIF date-times come back as Date objects in local time; keep the wall-clock reading. */
function isoLocal(value: unknown): string | null {
  if (value instanceof Date && !Number.isNaN(value.getTime())) {
    const pad = (n: number) => String(n).padStart(2, '0');
    return (
      `${value.getFullYear()}-${pad(value.getMonth() + 1)}-${pad(value.getDate())}` +
      `T${pad(value.getHours())}:${pad(value.getMinutes())}:${pad(value.getSeconds())}`
    );
  }
  return text(value);
}

/** Pixels per inch from the TIFF/EXIF resolution tags (unit 3 is per centimetre). */
function dpiOf(tags: Tags): number | null {
  const x = Number(tags.XResolution);
  if (!Number.isFinite(x) || x <= 0) return null;
  const perCm = [3, 'cm', 'Centimeters', 'centimeters'].includes(tags.ResolutionUnit as never);
  return Math.round((perCm ? x * 2.54 : x) * 100) / 100;
}

/**
 * Capture date, device, resolution and ICC description from the file's tags (exifr),
 * with pixel size and bit depth from the decoder. GPS is never read into the record.
 */
export async function readCaptureMetadata(
  path: string,
  image: ProbedImage,
): Promise<CaptureMetadata> {
  let tags: Tags = {};
  try {
    tags =
      ((await exifr.parse(path, {
        tiff: true,
        exif: true,
        gps: false,
        icc: true,
        xmp: false,
        iptc: false,
        translateValues: false,
        reviveValues: true,
      })) as Tags | undefined) ?? {};
  } catch {
    // A file without readable tags still has pixels; the record just says less.
  }
  const make = text(tags.Make);
  const model = text(tags.Model);
  const device = make && model && !model.startsWith(make) ? `${make} ${model}` : (model ?? make);
  return {
    capturedAt: isoLocal(tags.DateTimeOriginal ?? tags.CreateDate ?? tags.ModifyDate),
    device,
    software: text(tags.Software),
    dpi: dpiOf(tags),
    iccProfile: text(tags.ProfileDescription) ?? text(tags.description),
    width: image.width,
    height: image.height,
    bitDepth: image.bitDepth,
    channels: image.channels,
    format: image.format,
  };
}
