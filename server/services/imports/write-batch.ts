import type { PrintCreate } from '../../../shared/schemas/print';
import { notePrintsChanged } from '../../db/prints-changed';
import { writeTransaction } from '../../db/write-transaction';
import type { Transaction } from 'sequelize';
import { Print } from '../../models';
import { createPrint } from '../prints/create-print';
import type { PrintCommandContext } from '../prints/print-command';
import { derivedColumns } from '../prints/write-print';
import { insertMany, sqlDate } from '../../db/insert-many';

export interface NewRow {
  row: number;
  input: PrintCreate & { accessionNumber: string };
}

/**
 * Creates a batch of prints, their steps and one audit event each in one transaction:
 * a few multi-row inserts with bound values instead of a statement (and a model
 * instance) per row. If the batch fails as a
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

const PRINT_COLUMNS = [
  'accession_number',
  'title',
  'maker',
  'made_on',
  'made_from',
  'made_to',
  'process',
  'paper_id',
  'negative_id',
  'location_id',
  'image_width_mm',
  'image_height_mm',
  'sheet_width_mm',
  'sheet_height_mm',
  'edition',
  'status',
  'description',
  'tags',
  'fixing_minutes',
  'washing_minutes',
  'tone_status',
  'has_processing_risk',
  'risk_reasons',
  'created_by',
  'created_at',
  'updated_at',
];
const STEP_COLUMNS = [
  'print_id',
  'position',
  'stage',
  'chemical',
  'concentration_percent',
  'solution_batch_id',
  'method',
  'coats',
  'minutes',
  'temperature_c',
  'light_source',
  'notes',
];
const AUDIT_COLUMNS = ['at', 'user_id', 'action', 'entity', 'entity_id', 'before', 'after'];

async function insertRows(
  ctx: PrintCommandContext,
  rows: NewRow[],
  importId: number,
  transaction: Transaction,
): Promise<Print[]> {
  const now = sqlDate(new Date());
  await insertMany(
    ctx.sequelize,
    'prints',
    PRINT_COLUMNS,
    rows.map(({ input }) => {
      const derived = derivedColumns(input, input.processing);
      return [
        input.accessionNumber,
        input.title,
        input.maker ?? null,
        input.madeOn ?? null,
        derived.madeFrom,
        derived.madeTo,
        input.process,
        input.paperId ?? null,
        input.negativeId ?? null,
        input.locationId ?? null,
        input.imageWidthMm ?? null,
        input.imageHeightMm ?? null,
        input.sheetWidthMm ?? null,
        input.sheetHeightMm ?? null,
        input.edition ?? null,
        input.status,
        input.description ?? null,
        JSON.stringify(input.tags),
        derived.fixingMinutes,
        derived.washingMinutes,
        'unchecked',
        derived.hasProcessingRisk,
        JSON.stringify(derived.riskReasons),
        ctx.user.id,
        now,
        now,
      ];
    }),
    transaction,
  );
  // The new ids; the rest of each record is on disk already.
  const prints = await Print.findAll({
    attributes: ['id', 'accessionNumber'],
    where: { accessionNumber: rows.map(({ input }) => input.accessionNumber) },
    transaction,
  });
  const idOf = new Map(prints.map((print) => [print.accessionNumber, print.id]));
  // One change for the batch: the search index reads the new prints with one query.
  notePrintsChanged(
    transaction,
    prints.map((print) => print.id),
    'record',
  );
  await insertMany(
    ctx.sequelize,
    'processing_steps',
    STEP_COLUMNS,
    rows.flatMap(({ input }) =>
      input.processing.map((step, index) => [
        idOf.get(input.accessionNumber)!,
        index + 1,
        step.stage,
        step.chemical ?? null,
        step.concentrationPercent ?? null,
        step.solutionBatchId ?? null,
        step.method ?? null,
        step.coats ?? null,
        step.minutes ?? null,
        step.temperatureC ?? null,
        step.lightSource ?? null,
        step.notes ?? null,
      ]),
    ),
    transaction,
  );
  await insertMany(
    ctx.sequelize,
    'audit_events',
    AUDIT_COLUMNS,
    rows.map(({ input, row }) => [
      now,
      ctx.user.id,
      'create',
      'print',
      idOf.get(input.accessionNumber)!,
      null,
      JSON.stringify({ ...input, importedFrom: { importId, row } }),
    ]),
    transaction,
  );
  return prints;
}
