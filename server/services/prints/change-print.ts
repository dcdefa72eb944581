import { writeTransaction } from '../../db/write-transaction';
import { sheetSizeIssues, type PrintUpdate } from '../../../shared/schemas/print';
import { problems } from '../../middleware/problem';
import { refreshFixerRisk } from '../chemistry/fixer-risk';
import { fixingBatchIds } from '../chemistry/fixer-use';
import { followPlaceEdit } from '../movements/move-prints';
import { loadPrint } from './load-print';
import { auditPrint, snapshotOf, type PrintCommandContext } from './print-command';
import { changedRegistrarColumns } from './registrar-write';
import { assertLinksExist, derivedColumns, replaceSteps } from './write-print';

/** Applies a partial update; a given `processing` replaces the whole history. */
export async function updatePrint(ctx: PrintCommandContext, id: number, input: PrintUpdate) {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const loaded = await loadPrint(id, { transaction });
    // Taken before the instance is changed in place below.
    const before = snapshotOf(loaded);
    await assertLinksExist(input, transaction, id);
    const { processing, acquisition, provenance, rights, marks, ...fields } = input;
    const print = loaded.print;
    const batchesBefore = fixingBatchIds(print.processing ?? []);
    const placeBefore = print.locationId ?? null;
    print.set({
      ...fields,
      ...changedRegistrarColumns({ acquisition, provenance, rights, marks }),
    });
    // A PATCH of the sheet alone is checked against the image already recorded, and so on.
    const sizeIssues = sheetSizeIssues(print.get());
    if (sizeIssues.length) throw problems.invalid(sizeIssues);
    if (processing) await replaceSteps(id, processing, transaction);
    print.set(derivedColumns(print, processing ?? print.processing ?? []));
    await print.save({ transaction });
    // A new place is a movement; the print's place is then its latest movement's.
    await followPlaceEdit(ctx, id, placeBefore, input.locationId, transaction);
    // The print's date or baths may have changed: its fixers' use and its own rules follow.
    const batchesAfter = fixingBatchIds(processing ?? print.processing ?? []);
    await refreshFixerRisk([...new Set([...batchesBefore, ...batchesAfter])], transaction);
    const after = await loadPrint(id, { transaction });
    await auditPrint(ctx, 'update', id, { before, after: snapshotOf(after) }, transaction);
    return after;
  });
}

/** Soft-deletes a print (restorable); the accession number stays taken. */
export async function deletePrint(ctx: PrintCommandContext, id: number): Promise<void> {
  await writeTransaction(ctx.sequelize, async (transaction) => {
    const loaded = await loadPrint(id, { transaction });
    await loaded.print.destroy({ transaction });
    await refreshFixerRisk(fixingBatchIds(loaded.print.processing ?? []), transaction);
    await auditPrint(ctx, 'delete', id, { before: snapshotOf(loaded) }, transaction);
  });
}

/** Brings back a soft-deleted print. */
export async function restorePrint(ctx: PrintCommandContext, id: number) {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const loaded = await loadPrint(id, { transaction, includeDeleted: true });
    if (loaded.print.deletedAt) await loaded.print.restore({ transaction });
    await refreshFixerRisk(fixingBatchIds(loaded.print.processing ?? []), transaction);
    const restored = await loadPrint(id, { transaction });
    await auditPrint(ctx, 'restore', id, { after: snapshotOf(restored) }, transaction);
    return restored;
  });
}
