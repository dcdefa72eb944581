import type { Role } from '../../../shared/domain/roles';
import { problems } from '../../middleware/problem';
import type { Asset } from '../../models';
import { mayListDeletedPrints } from '../../policies/print';
import { findAssetById, printDeletedState } from '../../repositories/asset-repository';

/**
 * An image as the asker may reach it: 404 when it does not exist, or when its print is
 * deleted and the asker's role does not see deleted prints (its files, tiles and samples).
 */
export async function findVisibleAsset(id: number, role: Role): Promise<Asset> {
  const asset = await findAssetById(id);
  if (!asset) throw problems.notFound('The image');
  if (mayListDeletedPrints(role)) return asset;
  const print = await printDeletedState(asset.printId);
  if (!print || print.deleted) throw problems.notFound('The image');
  return asset;
}

/** An image record as the asset services hand it to routes. */
export type VisibleAsset = Awaited<ReturnType<typeof findVisibleAsset>>;
