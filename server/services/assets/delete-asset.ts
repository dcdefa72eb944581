import type { Sequelize } from 'sequelize';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import { Asset, Print, type User } from '../../models';
import { recordAudit } from '../audit';
import type { ImageServices } from '../images';
import { withHashLock } from './hash-lock';
import { marksWithoutImage } from './marks-without-image';

/**
 * Removes an asset; its original and derivatives go only when no other asset refers to
 * the same SHA-256. The print's list thumbnail falls back to its latest other recto.
 */
export async function deleteAsset(
  ctx: { sequelize: Sequelize; images: ImageServices; user: User },
  id: number,
): Promise<void> {
  const found = await Asset.findByPk(id, { attributes: ['id', 'sha256'] });
  if (!found) throw problems.notFound('The image');
  // Under the file's lock: an upload of the same bytes waits until the files are gone
  // (then stores them again), or has recorded its asset first (then they stay).
  await withHashLock(ctx.sequelize, found.sha256, async () => {
    const { asset, lastReference } = await removeRecord(ctx, id);
    if (!lastReference) return;
    await ctx.images.jobs.idleHere();
    await ctx.images.storage.delete(asset.storageKey);
    await ctx.images.derivatives.remove(asset.sha256);
  });
}

async function removeRecord(ctx: { sequelize: Sequelize; user: User }, id: number) {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const asset = await Asset.findByPk(id, { transaction });
    if (!asset) throw problems.notFound('The image');
    await asset.destroy({ transaction });
    const latestRecto = await Asset.findOne({
      where: { printId: asset.printId, view: 'recto' },
      order: [['id', 'DESC']],
      transaction,
    });
    const print = await Print.findByPk(asset.printId, {
      attributes: ['id', 'marks'],
      transaction,
      paranoid: false,
    });
    await Print.update(
      {
        rectoAssetId: latestRecto?.id ?? null,
        // A mark keeps its words when its photograph goes, but not an area on nothing.
        ...(print ? { marks: marksWithoutImage(print.marks, asset.id) } : {}),
      },
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
}
