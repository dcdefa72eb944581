import { rename, rm } from 'node:fs/promises';
import { DERIVATIVE_LONG_SIDE } from '../../../shared/domain/asset-views';
import { srgbPipeline } from './to-srgb';

export type DerivativeSize = keyof typeof DERIVATIVE_LONG_SIDE;

const JPEG_QUALITY = { thumbnail: 80, web: 86 } as const;

/**
 * Writes a JPEG derivative: orientation applied, colour converted to sRGB through the
 * embedded profile, 8-bit, and no EXIF, XMP or GPS block (sharp keeps metadata only
 * when asked; the sRGB profile is the one block written). Written beside, then renamed,
 * so a reader never sees half a file.
 */
export async function writeDerivative(
  input: string,
  source: { hasProfile: boolean },
  size: DerivativeSize,
  target: string,
): Promise<void> {
  const side = DERIVATIVE_LONG_SIDE[size];
  const partial = `${target}.partial`;
  try {
    await srgbPipeline(input, source)
      .rotate()
      .resize(side, side, { fit: 'inside', withoutEnlargement: true })
      .toColourspace('srgb')
      .jpeg({ quality: JPEG_QUALITY[size], mozjpeg: false })
      .toFile(partial);
    await rename(partial, target);
  } catch (error) {
    await rm(partial, { force: true });
    throw error;
  }
}
