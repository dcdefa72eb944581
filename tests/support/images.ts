import sharp, { type Sharp } from 'sharp';
import type { Test } from 'supertest';

type Rgb = [number, number, number];

/** A flat image of one 8-bit sRGB colour. */
export function flatRgb(width: number, height: number, rgb: Rgb): Sharp {
  return sharp({
    create: { width, height, channels: 3, background: { r: rgb[0], g: rgb[1], b: rgb[2] } },
  });
}

/** A JPEG with some structure (a gradient and a square), so it is not trivially small. */
export async function buildJpeg(
  width = 640,
  height = 480,
  rgb: Rgb = [150, 110, 80],
): Promise<Buffer> {
  const square = await flatRgb(Math.round(width / 3), Math.round(height / 3), [40, 25, 20])
    .png()
    .toBuffer();
  return flatRgb(width, height, rgb)
    .composite([{ input: square, left: Math.round(width / 4), top: Math.round(height / 4) }])
    .jpeg({ quality: 90 })
    .toBuffer();
}

/** A 16-bit TIFF whose stored pixels are `values` (0–65535), optionally tagged with a profile. */
export async function build16BitTiff(
  width: number,
  height: number,
  values: Rgb,
  options: { profile?: 'p3'; compression?: 'none' | 'lzw' | 'deflate' } = {},
): Promise<Buffer> {
  const raw = new Uint16Array(width * height * 3);
  for (let i = 0; i < raw.length; i += 3) raw.set(values, i);
  let image = sharp(raw, { raw: { width, height, channels: 3 } }).toColourspace('rgb16');
  // sharp converts 16-bit output from Display P3 (its 16-bit working space), so tagging
  // with P3 keeps the stored numbers exactly as given.
  if (options.profile) image = image.withIccProfile(options.profile);
  return image.tiff({ compression: options.compression ?? 'lzw' }).toBuffer();
}

type Parser = Parameters<Test['parse']>[0];

/** A supertest body parser that keeps the raw bytes (images, originals). */
export const binaryBody = ((
  res: NodeJS.ReadableStream,
  done: (e: Error | null, b: Buffer) => void,
) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}) as unknown as Parser;
