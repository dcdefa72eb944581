import type { Sequelize } from 'sequelize';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import { Asset, Print, type User } from '../../models';
import { recordAudit } from '../audit';
import type { ImageServices } from '../images';

/**
 * Removes an asset; its original and derivatives go only when no other asset refers to
 * the same SHA-256. The print's list thumbnail falls back to its latest other recto.
 */
export async function deleteAsset(
  ctx: { sequelize: Sequelize; images: ImageServices; user: User },
  id: number,
): Promise<void> {
  const { asset, lastReference } = await writeTransaction(ctx.sequelize, async (transaction) => {
    const asset = await Asset.findByPk(id, { transaction });
    if (!asset) throw problems.notFound('The image');
    await asset.destroy({ transaction });
    const latestRecto = await Asset.findOne({
      where: { printId: asset.printId, view: 'recto' },
      order: [['id', 'DESC']],
      transaction,
    });
    await Print.update(
      { rectoAssetId: latestRecto?.id ?? null },
      { where: { id: asset.printId }, transaction, paranoid: false },
    );
    await recordAudit(
      {
        user: ctx.user,
        action: 'delete',
        entity: 'asset',
        entityId: asset.id,
        before: { printId: asset.printId, view: asset.view, sha256: asset.sha256 },
      },
      transaction,
    );
    const others = await Asset.count({ where: { sha256: asset.sha256 }, transaction });
    return { asset, lastReference: others === 0 };
  });
  if (lastReference) {
    await ctx.images.jobs.idle();
    await ctx.images.storage.delete(asset.storageKey);
    await ctx.images.derivatives.remove(asset.sha256);
  }
}
