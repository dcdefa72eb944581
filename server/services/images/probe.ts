import sharp, { type Metadata } from 'sharp';
import { HttpProblem } from '../../middleware/problem';

/** Formats accepted for originals, decided from the content, with their media types. */
const ACCEPTED: Record<string, string> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  tiff: 'image/tiff',
  webp: 'image/webp',
};

export interface ProbedImage {
  format: string;
  mediaType: string;
  /** Pixel size as displayed, after the EXIF orientation is applied. */
  width: number;
  height: number;
  bitDepth: number;
  channels: number;
  hasProfile: boolean;
}

const notAnImage = () =>
  new HttpProblem(415, 'Unsupported media type', 'Send a JPEG, PNG, TIFF or WebP image.');

/** Reads the header of a file: 415 when it is not an accepted image. */
export async function probeImage(path: string): Promise<ProbedImage> {
  let metadata: Metadata;
  try {
    metadata = await sharp(path).metadata();
  } catch {
    throw notAnImage();
  }
  const mediaType = metadata.format ? ACCEPTED[metadata.format] : undefined;
  if (!mediaType || !metadata.width || !metadata.height) throw notAnImage();
  const turned = (metadata.orientation ?? 1) >= 5;
  return {
    format: metadata.format!,
    mediaType,
    width: turned ? metadata.height : metadata.width,
    height: turned ? metadata.width : metadata.height,
    bitDepth: bitDepthOf(metadata),
    channels: metadata.channels ?? 3,
    hasProfile: Boolean(metadata.hasProfile),
  };
}

function bitDepthOf(metadata: Metadata): number {
  if (metadata.bitsPerSample) return metadata.bitsPerSample;
  return metadata.depth === 'ushort' || metadata.depth === 'short' ? 16 : 8;
}

/** Whether sharp's pipeline runs this image in 16 bits (then it works in Display P3). */
export function isSixteenBit(image: Pick<ProbedImage, 'bitDepth'>): boolean {
  return image.bitDepth > 8;
}
