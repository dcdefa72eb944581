import { writeTransaction } from '../../db/write-transaction';
import type { PrintUpdate } from '../../../shared/schemas/print';
import { auditSnapshot } from '../../presenters/print';
import { recordAudit } from '../audit';
import type { PrintCommandContext } from './create-print';
import { loadPrint } from './load-print';
import { assertLinksExist, derivedColumns, replaceSteps } from './write-print';

/** Applies a partial update; a given `processing` replaces the whole history. */
export async function updatePrint(ctx: PrintCommandContext, id: number, input: PrintUpdate) {
  const updated = await writeTransaction(ctx.sequelize, async (transaction) => {
    const before = await loadPrint(id, { transaction });
    await assertLinksExist(input, transaction);
    const { processing, ...fields } = input;
    const print = before.print;
    const beforeSnapshot = auditSnapshot(print, before.locationPath);
    print.set(fields);
    if (processing) await replaceSteps(id, processing, transaction);
    print.set(derivedColumns(print, processing ?? print.processing ?? []));
    await print.save({ transaction });
    const after = await loadPrint(id, { transaction });
    await recordAudit(
      {
        user: ctx.user,
        action: 'update',
        entity: 'print',
        entityId: id,
        before: beforeSnapshot,
        after: auditSnapshot(after.print, after.locationPath),
      },
      transaction,
    );
    return after;
  });
  ctx.searchIndex.put(updated.print);
  return updated;
}

/** Soft-deletes a print (restorable); the accession number stays taken. */
export async function deletePrint(ctx: PrintCommandContext, id: number): Promise<void> {
  await writeTransaction(ctx.sequelize, async (transaction) => {
    const { print, locationPath } = await loadPrint(id, { transaction });
    await print.destroy({ transaction });
    await recordAudit(
      {
        user: ctx.user,
        action: 'delete',
        entity: 'print',
        entityId: id,
        before: auditSnapshot(print, locationPath),
      },
      transaction,
    );
  });
}

/** Brings back a soft-deleted print. */
export async function restorePrint(ctx: PrintCommandContext, id: number) {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const { print } = await loadPrint(id, { transaction, includeDeleted: true });
    if (print.deletedAt) await print.restore({ transaction });
    const after = await loadPrint(id, { transaction });
    await recordAudit(
      {
        user: ctx.user,
        action: 'restore',
        entity: 'print',
        entityId: id,
        after: auditSnapshot(after.print, after.locationPath),
      },
      transaction,
    );
    return after;
  });
}
