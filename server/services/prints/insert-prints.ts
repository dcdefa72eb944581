import type { Transaction } from 'sequelize';
import type { PrintCreate } from '../../../shared/schemas/print';
import { dialectOf } from '../../db/dialect';
import { insertMany, insertManyReturning } from '../../db/insert-many';
import { notePrintsChanged, recordNotedChanges } from '../../db/prints-changed';
import { together } from '../../db/together';
import { refreshFixerRisk } from '../chemistry/fixer-risk';
import { fixingBatchIds } from '../chemistry/fixer-use';
import { recordFirstPlaces } from '../movements/move-prints';
import type { PrintCommandContext } from './print-command';
import { newRegistrarColumns } from './registrar-write';
import { derivedColumns, stepValues } from './write-print';

/** Where a new print came from; kept on its audit event beside the record as written. */
export type CreateSource = { from: 'form' } | { from: 'import'; importId: number; row: number };

export interface NewPrint {
  input: PrintCreate;
  accessionNumber: string;
  source: CreateSource;
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
  'tone_flags',
  'tone_urgency',
  'has_processing_risk',
  'risk_reasons',
  'source_id',
  'acquisition',
  'provenance',
  'rights_statement',
  'rights',
  'marks',
  'created_by',
  'created_at',
  'updated_at',
] as const;

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
] as const;

const AUDIT_COLUMNS = ['at', 'user_id', 'action', 'entity', 'entity_id', 'before', 'after'];

/** A print's fields as written, steps numbered in order: what a create's audit event keeps. */
function writtenRecord({ input, accessionNumber }: NewPrint) {
  const { processing, ...fields } = input;
  return {
    ...fields,
    accessionNumber,
    ...derivedColumns(input, processing),
    registrar: newRegistrarColumns(fields),
    processing: processing.map((step, index) => ({ position: index + 1, ...stepValues(step) })),
  };
}

/**
 * The one way new prints are written, one or thousands: the form's create and every
 * import row come here. Inside the caller's write transaction it inserts the prints with
 * their derived fields, their steps and one audit event each (a few multi-row statements,
 * no model instance per row), re-derives the fixer-batch rules for the baths they used,
 * and notes the prints as changed. Returns the new ids in the order given.
 */
export async function insertPrints(
  ctx: PrintCommandContext,
  prints: readonly NewPrint[],
  transaction: Transaction,
): Promise<number[]> {
  if (prints.length === 0) return [];
  const now = dialectOf(ctx.sequelize).dateValue(new Date());
  const records = prints.map(writtenRecord);
  const written = await insertManyReturning<{ id: number; accession_number: string }>(
    ctx.sequelize,
    'prints',
    PRINT_COLUMNS,
    records.map((record) => [
      record.accessionNumber,
      record.title,
      record.maker ?? null,
      record.madeOn ?? null,
      record.madeFrom,
      record.madeTo,
      record.process,
      record.paperId ?? null,
      record.negativeId ?? null,
      record.locationId ?? null,
      record.imageWidthMm ?? null,
      record.imageHeightMm ?? null,
      record.sheetWidthMm ?? null,
      record.sheetHeightMm ?? null,
      record.edition ?? null,
      record.status,
      record.description ?? null,
      JSON.stringify(record.tags),
      record.fixingMinutes,
      record.washingMinutes,
      'unchecked',
      '[]',
      0,
      record.hasProcessingRisk,
      JSON.stringify(record.riskReasons),
      record.registrar.sourceId,
      jsonOrNull(record.registrar.acquisition),
      JSON.stringify(record.registrar.provenance),
      record.registrar.rightsStatement,
      jsonOrNull(record.registrar.rights),
      JSON.stringify(record.registrar.marks),
      ctx.user.id,
      now,
      now,
    ]),
    ['id', 'accession_number'],
    transaction,
  );
  // RETURNING gives the rows in no promised order: match them by accession number.
  const idOf = new Map(written.map((row) => [row.accession_number, Number(row.id)]));
  const ids = records.map((record) => idOf.get(record.accessionNumber)!);
  notePrintsChanged(transaction, ids, 'record');
  // Independent once the ids are known: sent at once, one wait for the driver inside the
  // write lock (db/together.ts), the change-feed row with them. The fixer-batch rules read
  // the steps just written, so they come after (and note their own changes).
  await together(
    insertMany(
      ctx.sequelize,
      'processing_steps',
      STEP_COLUMNS,
      records.flatMap((record, i) =>
        record.processing.map((step) => [
          ids[i],
          step.position,
          step.stage,
          step.chemical,
          step.concentrationPercent,
          step.solutionBatchId,
          step.method,
          step.coats,
          step.minutes,
          step.temperatureC,
          step.lightSource,
          step.notes,
        ]),
      ),
      transaction,
    ),
    insertMany(
      ctx.sequelize,
      'audit_events',
      AUDIT_COLUMNS,
      records.map(({ registrar: _columns, ...record }, i) => [
        now,
        ctx.user.id,
        'create',
        'print',
        ids[i],
        null,
        JSON.stringify({ ...record, source: prints[i]!.source }),
      ]),
      transaction,
    ),
    recordFirstPlaces(
      ctx,
      records.map((record, i) => ({ printId: ids[i]!, locationId: record.locationId })),
      transaction,
    ),
    recordNotedChanges(ctx.sequelize, transaction),
  );
  await refreshFixerRisk(
    [...new Set(prints.flatMap(({ input }) => fixingBatchIds(input.processing)))],
    transaction,
  );
  return ids;
}

const jsonOrNull = (value: unknown) => (value === null ? null : JSON.stringify(value));
