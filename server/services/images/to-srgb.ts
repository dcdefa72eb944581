import sharp, { type Sharp, type SharpOptions } from 'sharp';

/**
 * A sharp pipeline that reads `input` and ends in sRGB through its embedded profile.
 *
 * sharp imports an embedded profile to sRGB for 8-bit images, but for 16-bit images it
 * works in Display P3 (its `processingProfile`, sharp 0.35 pipeline.cc) and leaves the
 * pixels there. Asking for an sRGB output profile converts P3 → sRGB at 16-bit depth.
 * Untagged 16-bit images are taken as sRGB already (common practice for untagged files),
 * so they must not be "converted" from P3.
 */
export function srgbPipeline(
  input: string | Buffer,
  source: { hasProfile: boolean },
  options: SharpOptions = {},
): Sharp {
  const pipeline = sharp(input, { failOn: 'error', limitInputPixels: 400_000_000, ...options });
  return source.hasProfile ? pipeline.withIccProfile('srgb') : pipeline;
}
