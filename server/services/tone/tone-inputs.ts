import type { Sequelize, Transaction } from 'sequelize';
import type { Reading } from '../../../shared/domain/tone/comparison';
import type { StoredTone } from '../../../shared/domain/tone/stored-state';
import type { CheckWithReadings } from '../../../shared/domain/tone/trend';
import { dialectOf } from '../../db/dialect';
import { selectRows } from '../../db/select-rows';
import { together } from '../../db/together';
import { readJson } from '../../repositories/decode-columns';

/*
 * What a tone evaluation reads (`evaluate-prints.ts` decides and writes): the prints' stored
 * tone columns, their check rows and, for a selection by ids, their open alerts.
 */

/** Which prints: given ids (live or not), or the next live prints after an id, in id order. */
export type ToneSelection = { ids: readonly number[] } | { afterId: number; limit: number };

export interface PrintRow {
  id: number;
  tone_status: StoredTone['status'];
  tone_flags: unknown;
  tone_urgency: number;
  next_check_due: string | null;
  tone_baseline_on: string | null;
  tone_rate_per_year: number | null;
  tone_sparkline: unknown;
}

export interface CheckRow {
  id: number;
  print_id: number;
  checked_on: string;
  baseline: number | boolean;
  readings: string;
}

/** A check as the evaluation needs it, decoded once. */
export interface DecodedCheck extends CheckWithReadings {
  id: number;
  readings: Reading[];
}

const decodeRows = (rows: readonly CheckRow[]): DecodedCheck[] =>
  rows.map((row) => ({
    id: row.id,
    checkedOn: row.checked_on,
    baseline: Boolean(row.baseline),
    readings: readJson<Reading[]>(row.readings),
  }));

const PRINT_COLUMNS = `id, tone_status, tone_flags, tone_urgency, next_check_due, tone_baseline_on,
  tone_rate_per_year, tone_sparkline`;

/** `?, ?, …`: one positional value per id (a selection is at most TONE_BATCH ids). */
const marks = (ids: readonly unknown[]) => ids.map(() => '?').join(', ');

async function readPrints(
  sequelize: Sequelize,
  selection: ToneSelection,
  transaction: Transaction,
): Promise<PrintRow[]> {
  if ('ids' in selection) {
    if (selection.ids.length === 0) return [];
    return selectRows<PrintRow>(
      sequelize,
      `SELECT ${PRINT_COLUMNS} FROM prints WHERE id IN (${marks(selection.ids)}) ORDER BY id`,
      selection.ids,
      transaction,
    );
  }
  return selectRows<PrintRow>(
    sequelize,
    `SELECT ${PRINT_COLUMNS} FROM prints WHERE id > ? AND deleted_at IS NULL ORDER BY id LIMIT ?`,
    [selection.afterId, selection.limit],
    transaction,
  );
}

/** The check rows of the given prints, by print. */
async function readCheckRows(
  sequelize: Sequelize,
  printIds: readonly number[],
  transaction: Transaction,
): Promise<Map<number, CheckRow[]>> {
  const rowsOf = new Map<number, CheckRow[]>(printIds.map((id) => [id, []]));
  if (printIds.length === 0) return rowsOf;
  const rows = await selectRows<CheckRow>(
    sequelize,
    `SELECT id, print_id, checked_on, baseline, readings FROM tone_checks
      WHERE print_id IN (${marks(printIds)})`,
    printIds,
    transaction,
  );
  for (const row of rows) rowsOf.get(row.print_id)?.push(row);
  return rowsOf;
}

/**
 * The checks of a contiguous range of prints as one JSON text per print, in `DecodedCheck`'s
 * shape. Built by the database: 2,000 check rows made into 2,000 JavaScript objects were most
 * of a re-evaluation's main-thread time; 250 rows of text, built on SQLite's thread, are not.
 */
async function readCheckTexts(
  sequelize: Sequelize,
  firstId: number,
  lastId: number,
  transaction: Transaction,
): Promise<Map<number, string>> {
  const { stringAgg, typed } = dialectOf(sequelize);
  const check = `'{"id":' || id || ',"checkedOn":"' || ${typed('checked_on', 'text')}
    || '","baseline":' || CASE WHEN baseline THEN 'true' ELSE 'false' END
    || ',"readings":' || ${typed('readings', 'text')} || '}'`;
  const rows = await selectRows<{ print_id: number; checks: string }>(
    sequelize,
    `SELECT print_id, '[' || ${stringAgg(check, "','")} || ']' AS checks FROM tone_checks
      WHERE print_id >= ? AND print_id <= ? GROUP BY print_id`,
    [firstId, lastId],
    transaction,
  );
  return new Map(rows.map((row) => [row.print_id, row.checks]));
}

/** Some of the prints an evaluation reads, and a way to their checks (decoded when asked). */
export interface ToneInputPart {
  prints: PrintRow[];
  checksOf(printId: number): DecodedCheck[];
}

/** A part read by ids keeps its rows, so a check written afterwards can join them. */
interface RowsPart extends ToneInputPart {
  rowsOf: Map<number, CheckRow[]>;
}

const rowsPart = (prints: PrintRow[], rowsOf: Map<number, CheckRow[]>): RowsPart => ({
  prints,
  rowsOf,
  checksOf: (printId) => decodeRows(rowsOf.get(printId) ?? []),
});

const textsPart = (prints: PrintRow[], textOf: Map<number, string>): ToneInputPart => ({
  prints,
  checksOf: (printId) => {
    const text = textOf.get(printId);
    return text ? JSON.parse(text) : [];
  },
});

/** What an evaluation reads: the prints' stored state and checks (and, by ids, open alerts). */
export interface ToneInputs {
  /** In id order; a range's parts are read one ahead of the part being evaluated. */
  parts: Iterable<ToneInputPart> | AsyncIterable<ToneInputPart>;
  /** `print id + kind` of the unacknowledged alerts; read up front for a selection by ids. */
  openAlerts?: Set<string>;
  byIds: boolean;
}

/** The prints of a range read a part at a time (the checks of a range fill 16,000 rows). */
const RANGE_PART = 250;

/**
 * The checks of a range in parts of `RANGE_PART` prints: the next part is asked for before
 * the current one is handed over, so SQLite reads it while the evaluation decides on this
 * one (read all at once, the profile of a re-evaluation was a fifth waiting on SQLite).
 * One read at a time: reads sent together share the connection and all finish late.
 */
async function* rangeParts(
  sequelize: Sequelize,
  prints: PrintRow[],
  transaction: Transaction,
): AsyncGenerator<ToneInputPart> {
  const parts: PrintRow[][] = [];
  for (let start = 0; start < prints.length; start += RANGE_PART) {
    parts.push(prints.slice(start, start + RANGE_PART));
  }
  const read = (part: PrintRow[]) =>
    readCheckTexts(sequelize, part[0]!.id, part[part.length - 1]!.id, transaction);
  let next = parts.length > 0 ? read(parts[0]!) : null;
  try {
    for (let index = 0; index < parts.length; index += 1) {
      const textOf = await next!;
      next = index + 1 < parts.length ? read(parts[index + 1]!) : null;
      yield textsPart(parts[index]!, textOf);
    }
  } finally {
    // Stopped early (a failure): the read still going ends before the transaction does.
    await next?.catch(() => undefined);
  }
}

/** The inputs (by ids: one part) with one more check, written after they were read. */
export function withCheckRow(inputs: ToneInputs, row: CheckRow): ToneInputs {
  if (!Array.isArray(inputs.parts)) throw new Error('withCheckRow takes inputs read by ids');
  const parts = (inputs.parts as RowsPart[]).map((part) => {
    if (!part.rowsOf.has(row.print_id)) return part;
    const rowsOf = new Map(part.rowsOf);
    rowsOf.set(row.print_id, [...rowsOf.get(row.print_id)!, row]);
    return rowsPart(part.prints, rowsOf);
  });
  return { ...inputs, parts };
}

/**
 * Reads what `evaluateToneInputs` needs. Given ids, the prints, their checks and their open
 * alerts are read at once (one wait for the driver: a check is logged inside the write lock).
 */
export async function readToneInputs(
  sequelize: Sequelize,
  selection: ToneSelection,
  transaction: Transaction,
): Promise<ToneInputs> {
  if ('ids' in selection) {
    const [prints, rowsOf, openAlerts] = await together(
      readPrints(sequelize, selection, transaction),
      readCheckRows(sequelize, selection.ids, transaction),
      readOpenAlerts(sequelize, selection.ids, transaction),
    );
    return { parts: [rowsPart(prints, rowsOf)], openAlerts, byIds: true };
  }
  // A range needs its ids first.
  const prints = await readPrints(sequelize, selection, transaction);
  return { parts: rangeParts(sequelize, prints, transaction), byIds: false };
}

/** `print id + kind` of the unacknowledged alerts on these prints. */
export async function readOpenAlerts(
  sequelize: Sequelize,
  ids: readonly number[],
  transaction: Transaction,
): Promise<Set<string>> {
  if (ids.length === 0) return new Set();
  const open = await selectRows<{ print_id: number; kind: string }>(
    sequelize,
    `SELECT print_id, kind FROM alerts WHERE acknowledged_at IS NULL AND print_id IN (${marks(ids)})`,
    ids,
    transaction,
  );
  return new Set(open.map((row) => `${row.print_id} ${row.kind}`));
}
