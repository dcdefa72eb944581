import type { Transaction } from 'sequelize';
import type { AttachedImageView } from '../../../shared/types/condition';
import { problems } from '../../middleware/problem';
import { assetIdsOfPrint } from '../../repositories/asset-repository';

/**
 * 422 unless every id names an image of this print, so reports never point at another
 * print's photographs.
 */
export async function assertImagesOfPrint(
  printId: number,
  assetIds: readonly number[],
  path: string,
  transaction: Transaction,
): Promise<void> {
  if (assetIds.length === 0) return;
  const found = new Set(await assetIdsOfPrint(printId, assetIds, transaction));
  const errors = assetIds
    .map((id, index) => ({ id, index }))
    .filter(({ id }) => !found.has(id))
    .map(({ id, index }) => ({
      path: `${path}.${index}`,
      message: `Image ${id} is not an image of this print`,
    }));
  if (errors.length) throw problems.invalid(errors);
}

/** `images` followed by each plain `assetIds` entry not already among them, made by `make`. */
export function withLooseAssets<T extends { assetId: number }>(
  images: T[],
  assetIds: readonly number[] | undefined,
  make: (assetId: number) => T,
): T[] {
  const listed = new Set(images.map((image) => image.assetId));
  const loose: T[] = [];
  for (const id of assetIds ?? []) {
    if (listed.has(id)) continue;
    listed.add(id);
    loose.push(make(id));
  }
  return [...images, ...loose];
}

/** The URLs a client or the PDF uses for an attached image (contract: `/api/assets/:id/:size`). */
export function attachedImageUrls(assetId: number): NonNullable<AttachedImageView['urls']> {
  return { web: `/api/assets/${assetId}/web`, thumbnail: `/api/assets/${assetId}/thumbnail` };
}
