import { existsSync } from 'node:fs';
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { allowedScaleFactors, iiifSizeCap } from '../../../shared/domain/iiif-cap';
import type { DerivativeStore } from './derivative-store';

interface TileInfo {
  width: number;
  scaleFactors: number[];
  height?: number;
}

export interface ImageInfo {
  '@context': string;
  id: string;
  type: 'ImageService3';
  protocol: string;
  profile: 'level0';
  width: number;
  height: number;
  maxWidth?: number;
  maxHeight?: number;
  tiles: TileInfo[];
  sizes?: Array<{ width: number; height: number }>;
  extraFormats?: string[];
}

/**
 * The `info.json` sharp wrote, with our service id and, when `longSide` is given, the
 * size cap: `maxWidth`/`maxHeight` and only the scale factors that stay within it.
 */
export async function imageInfo(
  store: DerivativeStore,
  sha256: string,
  id: string,
  longSide: number | null,
): Promise<ImageInfo> {
  const written = JSON.parse(
    await readFile(join(store.tilesOf(sha256), 'info.json'), 'utf8'),
  ) as ImageInfo;
  const cap = iiifSizeCap(written.width, written.height, longSide);
  const info: ImageInfo = {
    '@context': 'http://iiif.io/api/image/3/context.json',
    id,
    type: 'ImageService3',
    protocol: 'http://iiif.io/api/image',
    profile: 'level0',
    width: written.width,
    height: written.height,
    tiles: written.tiles.map((tile) => ({
      ...tile,
      scaleFactors: allowedScaleFactors(tile.scaleFactors, written.width, written.height, cap),
    })),
  };
  if (longSide !== null && (cap.maxWidth < written.width || cap.maxHeight < written.height)) {
    info.maxWidth = cap.maxWidth;
    info.maxHeight = cap.maxHeight;
  }
  return info;
}

const REGION = /^(full|\d{1,6},\d{1,6},\d{1,6},\d{1,6})$/;
const SIZE = /^(max|\d{1,6},\d{1,6}|\d{1,6},)$/;

/** Width and height a size request asks for, given the region it scales. */
function requestedSize(size: string, regionW: number, regionH: number) {
  if (size === 'max') return { width: regionW, height: regionH };
  const [w, h] = size.split(',');
  const width = Number(w);
  return { width, height: h ? Number(h) : Math.round((regionH * width) / regionW) };
}

/**
 * The file of a tile request in the level-0 tree, or null. Clients round tile edges
 * differently (OpenSeadragon ceils, libvips may floor), so a size within a pixel of the
 * stored one is the same tile. Returns the effective scale of the request too, for the cap.
 */
export async function tileFile(
  store: DerivativeStore,
  sha256: string,
  image: { width: number; height: number },
  parts: { region: string; size: string; rotation: string; file: string },
): Promise<{ path: string; width: number; height: number; regionWidth: number } | null> {
  if (!REGION.test(parts.region) || !SIZE.test(parts.size)) return null;
  if (parts.rotation !== '0' || parts.file !== 'default.jpg') return null;
  const [, , regionW, regionH] =
    parts.region === 'full'
      ? [0, 0, image.width, image.height]
      : parts.region.split(',').map(Number);
  const wanted = requestedSize(parts.size, regionW!, regionH!);
  const regionDir = join(store.tilesOf(sha256), parts.region);
  if (!existsSync(regionDir)) return null;
  for (const stored of await readdir(regionDir)) {
    const [w, h] = stored.split(',').map(Number);
    if (Math.abs(w! - wanted.width) <= 1 && Math.abs(h! - wanted.height) <= 1) {
      const path = join(regionDir, stored, '0', 'default.jpg');
      if (existsSync(path)) return { path, width: w!, height: h!, regionWidth: regionW! };
    }
  }
  return null;
}
