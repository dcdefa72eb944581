import type { Role } from '../../../shared/domain/roles';
import { problems } from '../../middleware/problem';
import { Asset, Print } from '../../models';
import { mayListDeletedPrints } from '../../policies/print';

/**
 * An image as the asker may reach it: 404 when it does not exist, or when its print is
 * deleted and the asker's role does not see deleted prints (its files, tiles and samples).
 */
export async function findVisibleAsset(id: number, role: Role): Promise<Asset> {
  const asset = await Asset.findByPk(id);
  if (!asset) throw problems.notFound('The image');
  if (mayListDeletedPrints(role)) return asset;
  const print = await Print.findByPk(asset.printId, {
    attributes: ['id', 'deletedAt'],
    paranoid: false,
  });
  if (!print || print.deletedAt) throw problems.notFound('The image');
  return asset;
}
