import type { Transaction } from 'sequelize';
import { Asset, Print } from '../models';

export function findAssetById(id: number) {
  return Asset.findByPk(id);
}

/** A print's images in upload order. */
export function findAssetsOfPrint(printId: number) {
  return Asset.findAll({ where: { printId } });
}

/** Id, print and view of every image of these prints, in upload order. */
export function findAssetViewsOfPrints(printIds: readonly number[]) {
  return Asset.findAll({
    attributes: ['id', 'printId', 'view'],
    where: { printId: [...printIds] },
    order: [['id', 'ASC']],
  });
}

/** Whether a print exists and whether it is deleted (null: no such print). */
export async function printDeletedState(printId: number): Promise<{ deleted: boolean } | null> {
  const print = await Print.findByPk(printId, { attributes: ['id', 'deletedAt'], paranoid: false });
  return print ? { deleted: Boolean(print.deletedAt) } : null;
}

/** Which of `ids` are images of this print. */
export async function assetIdsOfPrint(
  printId: number,
  ids: readonly number[],
  transaction?: Transaction,
): Promise<number[]> {
  const assets = await Asset.findAll({
    attributes: ['id'],
    where: { printId, id: [...ids] },
    transaction,
  });
  return assets.map((asset) => asset.id);
}
