import { writeTransaction } from '../../db/write-transaction';
import type { PrintCreate } from '../../../shared/schemas/print';
import { Print } from '../../models';
import { refreshFixerRisk } from '../chemistry/fixer-risk';
import { fixingBatchIds } from '../chemistry/fixer-use';
import { assignAccessionNumber } from './accession';
import { loadPrint } from './load-print';
import { auditPrint, snapshotOf, type PrintCommandContext } from './print-command';
import { assertLinksExist, derivedColumns, insertSteps } from './write-print';

/**
 * Creates a print with its processing history and audit event in one transaction.
 * IMMEDIATE takes the write lock first, so two creates never read the same counter.
 */
export async function createPrint(ctx: PrintCommandContext, input: PrintCreate) {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    await assertLinksExist(input, transaction);
    const accessionNumber =
      input.accessionNumber ?? (await assignAccessionNumber(new Date().getFullYear(), transaction));
    const { processing, ...fields } = input;
    const print = await Print.create(
      {
        ...fields,
        accessionNumber,
        ...derivedColumns(fields, processing),
        createdBy: ctx.user.id,
      },
      { transaction },
    );
    await insertSteps(print.id, processing, transaction);
    await refreshFixerRisk(fixingBatchIds(processing), transaction);
    const loaded = await loadPrint(print.id, { transaction });
    await auditPrint(ctx, 'create', print.id, { after: snapshotOf(loaded) }, transaction);
    return loaded;
  });
}
