import { rename, rm } from 'node:fs/promises';
import type { DerivativeStore } from './derivative-store';
import { srgbPipeline } from './to-srgb';

export const TILE_SIZE = 512;

/**
 * A level-0 IIIF Image API 3.0 tile tree with sharp's `iiif3` layout: JPEG tiles of
 * 512 px at every scale factor, plus the small `full/w,h` sizes, in sRGB.
 * sharp writes `<dir>/<name>/…`; we build beside and rename so readers see all or nothing.
 */
export async function writeTiles(
  input: string,
  source: { hasProfile: boolean },
  store: DerivativeStore,
  sha256: string,
): Promise<void> {
  const target = store.tilesOf(sha256);
  const partial = `${target}.partial`;
  await rm(partial, { recursive: true, force: true });
  try {
    await srgbPipeline(input, source)
      .rotate()
      .toColourspace('srgb')
      .jpeg({ quality: 84 })
      .tile({ layout: 'iiif3', size: TILE_SIZE, id: 'https://printwarden.invalid/iiif' })
      .toFile(partial);
    await rm(target, { recursive: true, force: true });
    await rename(partial, target);
  } catch (error) {
    await rm(partial, { recursive: true, force: true });
    throw error;
  }
}
