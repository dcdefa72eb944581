import type { Sequelize, Transaction } from 'sequelize';
import type { Reading } from '../../../shared/domain/tone/comparison';
import type { PrintToneState } from '../../../shared/domain/tone/evaluate';
import type { ToneSettings } from '../../../shared/domain/tone/settings';
import { nextStoredTone, type StoredTone } from '../../../shared/domain/tone/stored-state';
import type { CheckWithReadings } from '../../../shared/domain/tone/trend';
import { dialectOf } from '../../db/dialect';
import { runBound } from '../../db/insert-many';
import { notePrintsChanged } from '../../db/prints-changed';
import { selectRows } from '../../db/select-rows';
import { together } from '../../db/together';
import { rederiveProcessingRisk } from '../prints/processing-risk';
import { readJson, readJsonText } from '../../repositories/decode-columns';

/** Most prints evaluated by one statement set (bound values stay well under SQLite's limit). */
export const TONE_BATCH = 2000;

/** Which prints: given ids (live or not), or the next live prints after an id, in id order. */
export type ToneSelection = { ids: readonly number[] } | { afterId: number; limit: number };

/** A check as the evaluation needs it, decoded once. */
export interface DecodedCheck extends CheckWithReadings {
  id: number;
  readings: Reading[];
}

interface PrintRow {
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

export interface ToneEvaluation {
  /**
   * Each selected print's new state and checks, by print id: for a selection by ids only
   * (a caller answering with them). A range keeps none: holding a whole range's trends
   * until its end tripled the garbage collector's time at 100,000 prints.
   */
  states: Map<number, PrintToneState>;
  /** The checks as decoded (date order is the domain's business); ids selection only. */
  checksOf: Map<number, DecodedCheck[]>;
  /** The selected prints in id order (the last one is where the next range starts). */
  printIds: number[];
  /** Prints whose stored state moved and was written. */
  changedIds: number[];
}

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

/** The check rows of the given prints, by print (a contiguous id range is read as one range). */
async function readCheckRows(
  sequelize: Sequelize,
  printIds: readonly number[],
  range: boolean,
  transaction: Transaction,
): Promise<Map<number, CheckRow[]>> {
  const rowsOf = new Map<number, CheckRow[]>(printIds.map((id) => [id, []]));
  if (printIds.length === 0) return rowsOf;
  const columns = 'SELECT id, print_id, checked_on, baseline, readings FROM tone_checks';
  const rows = range
    ? await selectRows<CheckRow>(
        sequelize,
        `${columns} WHERE print_id >= ? AND print_id <= ?`,
        [printIds[0], printIds[printIds.length - 1]],
        transaction,
      )
    : await selectRows<CheckRow>(
        sequelize,
        `${columns} WHERE print_id IN (${marks(printIds)})`,
        printIds,
        transaction,
      );
  for (const row of rows) rowsOf.get(row.print_id)?.push(row);
  return rowsOf;
}

/**
 * Decoded one print at a time, just before its evaluation: the readings of a whole range
 * decoded up front lived until the range's end, and the garbage collector paid for it.
 */
const decoded = (rows: readonly CheckRow[]): DecodedCheck[] =>
  rows.map((row) => ({
    id: row.id,
    checkedOn: row.checked_on,
    baseline: Boolean(row.baseline),
    readings: readJson<Reading[]>(row.readings),
  }));

const storedOf = (row: PrintRow): StoredTone => ({
  status: row.tone_status,
  flags: readJsonText(row.tone_flags)!,
  urgency: row.tone_urgency,
  nextCheckDue: row.next_check_due,
  baselineOn: row.tone_baseline_on,
  ratePerYear: row.tone_rate_per_year,
  sparkline: readJsonText(row.tone_sparkline),
});

/** Some of the prints an evaluation reads, with their check rows. */
export interface ToneInputPart {
  prints: PrintRow[];
  rowsOf: Map<number, CheckRow[]>;
}

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
 * one (read all at once, the evaluation waited for the reading: a fifth of a re-evaluation).
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
    readCheckRows(
      sequelize,
      part.map((print) => print.id),
      true,
      transaction,
    );
  let next = parts.length > 0 ? read(parts[0]!) : null;
  try {
    for (let index = 0; index < parts.length; index += 1) {
      const rowsOf = await next!;
      next = index + 1 < parts.length ? read(parts[index + 1]!) : null;
      yield { prints: parts[index]!, rowsOf };
    }
  } finally {
    // Stopped early (a failure): the read still going ends before the transaction does.
    await next?.catch(() => undefined);
  }
}

/** The inputs (by ids: one part) with one more check, written after they were read. */
export function withCheckRow(inputs: ToneInputs, row: CheckRow): ToneInputs {
  if (!Array.isArray(inputs.parts)) throw new Error('withCheckRow takes inputs read by ids');
  const parts = (inputs.parts as ToneInputPart[]).map((part) => {
    if (!part.rowsOf.has(row.print_id)) return part;
    const rowsOf = new Map(part.rowsOf);
    rowsOf.set(row.print_id, [...rowsOf.get(row.print_id)!, row]);
    return { ...part, rowsOf };
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
      readCheckRows(sequelize, selection.ids, false, transaction),
      readOpenAlerts(sequelize, selection.ids, transaction),
    );
    return { parts: [{ prints, rowsOf }], openAlerts, byIds: true };
  }
  // A range needs its ids first.
  const prints = await readPrints(sequelize, selection, transaction);
  return { parts: rangeParts(sequelize, prints, transaction), byIds: false };
}

/**
 * The one tone evaluation of stored prints, for one print after a check and for every
 * print after a settings change: reads the prints' stored state and checks, decides each
 * new state with the shared domain (`nextStoredTone`), writes only the prints whose state
 * moved (one statement), re-derives the processing-risk reasons where the baseline date
 * moved, opens one alert per status change (unless one of that kind is open) and notes the
 * changed prints, so the search index and caches have them once the transaction commits.
 */
export async function evaluatePrints(
  sequelize: Sequelize,
  settings: ToneSettings,
  selection: ToneSelection,
  transaction: Transaction,
): Promise<ToneEvaluation> {
  const inputs = await readToneInputs(sequelize, selection, transaction);
  return evaluateToneInputs(sequelize, settings, inputs, transaction);
}

/**
 * `evaluatePrints` on inputs already read. `alongside` gives statements of the caller's
 * (an audit row, the change-feed row) that are sent with the evaluation's own writes,
 * once the changed prints are noted.
 */
export async function evaluateToneInputs(
  sequelize: Sequelize,
  settings: ToneSettings,
  { parts, openAlerts, byIds }: ToneInputs,
  transaction: Transaction,
  alongside: () => Array<Promise<unknown>> = () => [],
): Promise<ToneEvaluation> {
  const printIds: number[] = [];
  const states = new Map<number, PrintToneState>();
  const checksOf = new Map<number, DecodedCheck[]>();
  const changedIds: number[] = [];
  const movedBaselines: number[] = [];
  const values: unknown[] = [];
  const alerts: Alert[] = [];
  const decide = (print: PrintRow, checks: DecodedCheck[]) => {
    const next = nextStoredTone(storedOf(print), checks, settings);
    if (byIds) {
      states.set(print.id, next.state);
      checksOf.set(print.id, checks);
    }
    if (next.alert) alerts.push({ printId: print.id, ...next.alert });
    if (!next.changed) return;
    changedIds.push(print.id);
    if (next.baselineMoved) movedBaselines.push(print.id);
    const { status, flags, urgency, nextCheckDue, baselineOn, ratePerYear, sparkline } =
      next.stored;
    values.push(print.id, status, flags, urgency, nextCheckDue, baselineOn, ratePerYear, sparkline);
  };
  for await (const { prints, rowsOf } of parts) {
    for (const print of prints) {
      printIds.push(print.id);
      decide(print, decoded(rowsOf.get(print.id) ?? []));
    }
  }
  const writes: Array<Promise<unknown>> = [];
  if (changedIds.length > 0) {
    // Typed where the database needs it: NULL or text in a VALUES list is not a date or JSON.
    const { typed } = dialectOf(sequelize);
    const row = [
      ...['?', '?', typed('?', 'json'), typed('?', 'real')],
      ...[typed('?', 'date'), typed('?', 'date'), typed('?', 'real'), typed('?', 'json')],
    ].join(', ');
    const tuples = changedIds.map(() => `(${row})`).join(', ');
    writes.push(
      runBound(
        sequelize,
        `UPDATE prints SET tone_status = v.column2, tone_flags = v.column3, tone_urgency = v.column4,
         next_check_due = v.column5, tone_baseline_on = v.column6, tone_rate_per_year = v.column7,
         tone_sparkline = v.column8
       FROM (VALUES ${tuples}) AS v WHERE prints.id = v.column1`,
        values,
        transaction,
      ),
    );
    notePrintsChanged(transaction, changedIds, 'tone');
  }
  const alreadyOpen =
    openAlerts ??
    (alerts.length > 0
      ? await readOpenAlerts(sequelize, [...new Set(alerts.map((a) => a.printId))], transaction)
      : new Set<string>());
  writes.push(openNewAlerts(sequelize, alerts, alreadyOpen, transaction), ...alongside());
  await together(...writes);
  // The baseline date is an input of one risk rule; nothing else a tone state holds is.
  await rederiveProcessingRisk(movedBaselines, transaction);
  return { states, checksOf, printIds, changedIds };
}

interface Alert {
  printId: number;
  kind: string;
  reason: string;
}

/** `print id + kind` of the unacknowledged alerts on these prints. */
async function readOpenAlerts(
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

/** One change opens one alert: an unacknowledged alert of the same kind already says it. */
async function openNewAlerts(
  sequelize: Sequelize,
  alerts: readonly Alert[],
  already: ReadonlySet<string>,
  transaction: Transaction,
): Promise<void> {
  const fresh = alerts.filter((alert) => !already.has(`${alert.printId} ${alert.kind}`));
  if (fresh.length === 0) return;
  // As Sequelize writes DATE columns: an ISO string would read back as an invalid date.
  const now = dialectOf(sequelize).dateValue(new Date());
  await runBound(
    sequelize,
    `INSERT INTO alerts (print_id, kind, reason, opened_at) VALUES ${fresh.map(() => '(?, ?, ?, ?)').join(', ')}`,
    fresh.flatMap((alert) => [alert.printId, alert.kind, alert.reason, now]),
    transaction,
  );
}
