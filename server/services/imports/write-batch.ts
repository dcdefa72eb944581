import type { PrintCreate } from '../../../shared/schemas/print';
import { writeTransaction } from '../../db/write-transaction';
import type { HttpProblem } from '../../middleware/problem';
import { insertPrints, type NewPrint } from '../prints/insert-prints';
import type { PrintCommandContext } from '../prints/print-command';
import { assertLinksExist } from '../prints/write-print';

export interface NewRow {
  row: number;
  input: PrintCreate & { accessionNumber: string };
}

const asNewPrint = ({ row, input }: NewRow, importId: number): NewPrint => ({
  input,
  accessionNumber: input.accessionNumber,
  source: { from: 'import', importId, row },
});

/**
 * Creates a batch of prints in one transaction, through the same insert as the form's
 * create (insertPrints). If the batch fails as a whole (say another user just took one of
 * its numbers), each row is tried on its own, so one bad row never takes the others with it.
 */
export async function createBatch(
  ctx: PrintCommandContext,
  rows: NewRow[],
  importId: number,
): Promise<{ created: number[]; failed: Array<{ row: number; message: string }> }> {
  if (rows.length === 0) return { created: [], failed: [] };
  try {
    const created = await writeTransaction(ctx.sequelize, (transaction) =>
      insertPrints(
        ctx,
        rows.map((row) => asNewPrint(row, importId)),
        transaction,
      ),
    );
    return { created, failed: [] };
  } catch {
    const created: number[] = [];
    const failed: Array<{ row: number; message: string }> = [];
    for (const row of rows) {
      try {
        const [id] = await writeTransaction(ctx.sequelize, async (transaction) => {
          await assertLinksExist(row.input, transaction);
          return insertPrints(ctx, [asNewPrint(row, importId)], transaction);
        });
        created.push(id!);
      } catch (error) {
        // A field's own message ("IMP.7 is already in use") says more than the summary.
        const problem = error as HttpProblem;
        const message = problem.errors?.[0]?.message ?? problem.message;
        failed.push({ row: row.row, message: message || 'Could not be saved' });
      }
    }
    return { created, failed };
  }
}
