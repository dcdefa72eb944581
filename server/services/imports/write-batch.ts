import type { PrintCreate } from '../../../shared/schemas/print';
import { writeTransaction } from '../../db/write-transaction';
import { AuditEvent, Print, ProcessingStep } from '../../models';
import { createPrint } from '../prints/create-print';
import type { PrintCommandContext } from '../prints/print-command';
import { derivedColumns } from '../prints/write-print';

export interface NewRow {
  row: number;
  input: PrintCreate & { accessionNumber: string };
}

/**
 * Creates a batch of prints, their steps and one audit event each in one transaction:
 * a few multi-row inserts instead of thousands of statements. If the batch fails as a
 * whole (say another user just took one of its numbers), each row is tried on its own,
 * so one bad row never takes the others with it.
 */
export async function createBatch(
  ctx: PrintCommandContext,
  rows: NewRow[],
  importId: number,
): Promise<{ created: Print[]; failed: Array<{ row: number; message: string }> }> {
  if (rows.length === 0) return { created: [], failed: [] };
  try {
    const created = await writeTransaction(ctx.sequelize, (transaction) =>
      insertRows(ctx, rows, importId, transaction),
    );
    return { created, failed: [] };
  } catch {
    const created: Print[] = [];
    const failed: Array<{ row: number; message: string }> = [];
    for (const { row, input } of rows) {
      try {
        created.push((await createPrint(ctx, input)).print);
      } catch (error) {
        failed.push({ row, message: (error as Error).message || 'Could not be saved' });
      }
    }
    return { created, failed };
  }
}

async function insertRows(
  ctx: PrintCommandContext,
  rows: NewRow[],
  importId: number,
  transaction: Parameters<Parameters<typeof writeTransaction>[1]>[0],
): Promise<Print[]> {
  const prints = await Print.bulkCreate(
    rows.map(({ input }) => {
      const { processing, ...fields } = input;
      return { ...fields, ...derivedColumns(fields, processing), createdBy: ctx.user.id };
    }),
    { transaction },
  );
  // SQLite reports the ids of a multi-row insert; check rather than trust.
  if (prints.some((print) => !print.id)) throw new Error('Inserted rows came back without ids');
  await ProcessingStep.bulkCreate(
    rows.flatMap(({ input }, index) =>
      input.processing.map((step, position) => ({
        printId: prints[index]!.id,
        position: position + 1,
        stage: step.stage,
        chemical: step.chemical ?? null,
        concentrationPercent: step.concentrationPercent ?? null,
        solutionBatchId: step.solutionBatchId ?? null,
        method: step.method ?? null,
        coats: step.coats ?? null,
        minutes: step.minutes ?? null,
        temperatureC: step.temperatureC ?? null,
        lightSource: step.lightSource ?? null,
        notes: step.notes ?? null,
      })),
    ),
    { transaction },
  );
  const at = new Date();
  await AuditEvent.bulkCreate(
    rows.map(({ input, row }, index) => ({
      at,
      userId: ctx.user.id,
      action: 'create',
      entity: 'print',
      entityId: prints[index]!.id,
      before: null,
      after: { ...input, importedFrom: { importId, row } },
    })),
    { transaction },
  );
  return prints;
}
