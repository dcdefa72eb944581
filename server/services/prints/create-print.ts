import { writeTransaction } from '../../db/write-transaction';
import type { PrintCreate } from '../../../shared/schemas/print';
import { assignAccessionNumber } from './accession';
import { insertPrints } from './insert-prints';
import { readPrint } from './read-print';
import type { PrintCommandContext } from './print-command';
import { assertLinksExist } from './write-print';

/**
 * Creates a print with its processing history and audit event in one transaction, through
 * the same insert as an import row. IMMEDIATE takes the write lock first, so two creates
 * never read the same counter. The record is read back after the commit, outside the lock.
 */
export async function createPrint(ctx: PrintCommandContext, input: PrintCreate) {
  const [id] = await writeTransaction(ctx.sequelize, async (transaction) => {
    await assertLinksExist(input, transaction);
    const accessionNumber =
      input.accessionNumber ??
      (await assignAccessionNumber(ctx.sequelize, new Date().getFullYear(), transaction));
    return insertPrints(ctx, [{ input, accessionNumber, source: { from: 'form' } }], transaction);
  });
  return readPrint(ctx.sequelize, id!);
}
