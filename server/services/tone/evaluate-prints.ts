import type { Sequelize, Transaction } from 'sequelize';
import type { PrintToneState } from '../../../shared/domain/tone/evaluate';
import type { ToneSettings } from '../../../shared/domain/tone/settings';
import { nextStoredTone, type StoredTone } from '../../../shared/domain/tone/stored-state';
import { dialectOf } from '../../db/dialect';
import { runBound } from '../../db/insert-many';
import { notePrintsChanged } from '../../db/prints-changed';
import { together } from '../../db/together';
import {
  readOpenAlerts,
  readToneInputs,
  type DecodedCheck,
  type PrintRow,
  type ToneInputs,
  type ToneSelection,
} from './tone-inputs';
import { rederiveProcessingRisk } from '../prints/processing-risk';
import { readJsonText } from '../../repositories/decode-columns';

/** Most prints evaluated by one statement set (bound values stay well under SQLite's limit). */
export const TONE_BATCH = 2000;

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

const storedOf = (row: PrintRow): StoredTone => ({
  status: row.tone_status,
  flags: readJsonText(row.tone_flags)!,
  urgency: row.tone_urgency,
  nextCheckDue: row.next_check_due,
  baselineOn: row.tone_baseline_on,
  ratePerYear: row.tone_rate_per_year,
  sparkline: readJsonText(row.tone_sparkline),
});

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
  // Decoded one print at a time, just before its evaluation: a whole range's readings
  // decoded up front lived until the range's end, and the garbage collector paid for it.
  for await (const part of parts) {
    for (const print of part.prints) {
      printIds.push(print.id);
      decide(print, part.checksOf(print.id));
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
