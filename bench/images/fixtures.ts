import { existsSync, mkdirSync, renameSync } from 'node:fs';
import { join, resolve } from 'node:path';
import sharp from 'sharp';

/** Bench inputs, generated once and kept in `.tmp/bench-images` (git-ignored). */
export const FIXTURE_DIR = resolve('.tmp', 'bench-images');

/** Warm-toned noise: detail everywhere, so decoders and encoders cannot take shortcuts. */
async function write(path: string, width: number, height: number, kind: 'tiff16' | 'jpeg') {
  if (existsSync(path)) return path;
  mkdirSync(FIXTURE_DIR, { recursive: true });
  const noise = sharp({
    create: {
      width,
      height,
      channels: 3,
      background: '#000',
      noise: { type: 'gaussian', mean: 128, sigma: 40 },
    },
  }).linear([0.9, 0.7, 0.55], [20, 12, 8]);
  const raw = await noise.raw().toBuffer();
  const image =
    kind === 'tiff16'
      ? sharp(raw, { raw: { width, height, channels: 3 } })
          .toColourspace('rgb16')
          .tiff({ compression: 'none' })
      : sharp(raw, { raw: { width, height, channels: 3 } }).jpeg({ quality: 90 });
  await image.toFile(`${path}.partial`);
  renameSync(`${path}.partial`, path);
  return path;
}

/** A 600 dpi scan of an 8×10 in sheet: 6600 × 4400 ≈ 29 megapixels, 16-bit, uncompressed. */
export const tiff29 = () => write(join(FIXTURE_DIR, 'scan-29mp-16bit.tif'), 6600, 4400, 'tiff16');
/** A 24-megapixel camera JPEG. */
export const jpeg24 = () => write(join(FIXTURE_DIR, 'camera-24mp.jpg'), 6000, 4000, 'jpeg');
/** About 200 MB: a 16-bit uncompressed TIFF of 7500 × 4450. */
export const tiff200mb = () =>
  write(join(FIXTURE_DIR, 'scan-200mb-16bit.tif'), 7500, 4450, 'tiff16');
