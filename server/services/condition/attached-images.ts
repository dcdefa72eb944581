import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { AttachedImageView } from '../../../shared/types/condition';
import { problems } from '../../middleware/problem';

/**
 * 422 unless every id names an image of this print. Reads the assets table the images
 * area owns (`assets.print_id`), so reports never point at another print's photographs.
 */
export async function assertImagesOfPrint(
  sequelize: Sequelize,
  printId: number,
  assetIds: readonly number[],
  path: string,
  transaction: Transaction,
): Promise<void> {
  if (assetIds.length === 0) return;
  const found = new Set(await imagesOfPrint(sequelize, printId, assetIds, transaction));
  const errors = assetIds
    .map((id, index) => ({ id, index }))
    .filter(({ id }) => !found.has(id))
    .map(({ id, index }) => ({
      path: `${path}.${index}`,
      message: `Image ${id} is not an image of this print`,
    }));
  if (errors.length) throw problems.invalid(errors);
}

async function imagesOfPrint(
  sequelize: Sequelize,
  printId: number,
  ids: readonly number[],
  transaction?: Transaction,
): Promise<number[]> {
  const rows = await sequelize.query<{ id: number }>(
    'SELECT id FROM assets WHERE print_id = :printId AND id IN (:ids)',
    { replacements: { printId, ids: [...ids] }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((row) => Number(row.id));
}

/** The URLs a client or the PDF uses for an attached image (contract: `/api/assets/:id/:size`). */
export function attachedImageUrls(assetId: number): NonNullable<AttachedImageView['urls']> {
  return { web: `/api/assets/${assetId}/web`, thumbnail: `/api/assets/${assetId}/thumbnail` };
}
