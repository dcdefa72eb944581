import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { evaluatePrintChecks } from '../../../shared/domain/tone/evaluate';
import type { Reading } from '../../../shared/domain/tone/comparison';
import type { ToneSettings } from '../../../shared/domain/tone/settings';
import type { ToneStatus } from '../../../shared/domain/vocabulary';
import type { ReevaluationProgress } from '../../../shared/types/tone';
import { runBound, sqlDate } from '../../db/insert-many';
import type { BackgroundWork } from '../background';
import { writeTransaction } from '../../db/write-transaction';
import { statusChangeAlert } from './evaluate-print';
import { loadToneSettings } from './settings-store';

/** Most prints per write transaction (large collections). */
const BATCH = 2500;
/** Progress moves in about this many steps however small the collection. */
const PROGRESS_STEPS = 20;

interface CheckRow {
  id: number;
  print_id: number;
  checked_on: string;
  baseline: number | boolean;
  readings: string;
}

/**
 * Re-evaluates every print's tone state after a settings change, a batch of prints per
 * write transaction (reads and writes of a batch in one transaction, so a check logged
 * meanwhile is never overwritten by a stale result). Settings never move a baseline, so the
 * processing-risk reasons stay as they are.
 */
export async function reevaluateAllPrints(
  sequelize: Sequelize,
  onProgress: (done: number, total: number) => void = () => undefined,
): Promise<number> {
  const settings = await loadToneSettings();
  const [{ total }] = (await sequelize.query<{ total: number }>(
    'SELECT COUNT(*) AS total FROM prints WHERE deleted_at IS NULL',
    { type: QueryTypes.SELECT },
  )) as [{ total: number }];
  let done = 0;
  let afterId = 0;
  // A collection smaller than one batch would jump from 0 to all at once: cut it in steps,
  // so "done" always counts the prints whose new state is committed.
  const batch = Math.min(BATCH, Math.max(1, Math.ceil(total / PROGRESS_STEPS)));
  onProgress(0, total);
  for (;;) {
    const processed = await writeTransaction(sequelize, (transaction) =>
      reevaluateBatch(sequelize, settings, afterId, batch, transaction),
    );
    if (processed.count === 0) break;
    done += processed.count;
    afterId = processed.lastId;
    onProgress(Math.min(done, total), total);
  }
  return done;
}

async function reevaluateBatch(
  sequelize: Sequelize,
  settings: ToneSettings,
  afterId: number,
  batch: number,
  transaction: Transaction,
): Promise<{ count: number; lastId: number }> {
  const prints = await sequelize.query<{ id: number; tone_status: ToneStatus }>(
    'SELECT id, tone_status FROM prints WHERE id > ? AND deleted_at IS NULL ORDER BY id LIMIT ?',
    { replacements: [afterId, batch], type: QueryTypes.SELECT, transaction },
  );
  if (prints.length === 0) return { count: 0, lastId: afterId };
  const lastId = prints[prints.length - 1]!.id;
  const rows = await sequelize.query<CheckRow>(
    'SELECT id, print_id, checked_on, baseline, readings FROM tone_checks WHERE print_id > ? AND print_id <= ?',
    { replacements: [afterId, lastId], type: QueryTypes.SELECT, transaction },
  );
  const checksOf = new Map<
    number,
    Array<{ id: number; checkedOn: string; baseline: boolean; readings: Reading[] }>
  >();
  for (const row of rows) {
    const list = checksOf.get(row.print_id) ?? [];
    list.push({
      id: row.id,
      checkedOn: row.checked_on,
      baseline: Boolean(row.baseline),
      readings: JSON.parse(row.readings) as Reading[],
    });
    checksOf.set(row.print_id, list);
  }
  const open = await openAlertKinds(sequelize, afterId, lastId, transaction);
  const values: unknown[] = [];
  const alerts: unknown[] = [];
  // As Sequelize writes DATE columns: an ISO string would read back as an invalid date.
  const now = sqlDate(new Date());
  for (const print of prints) {
    const state = evaluatePrintChecks(checksOf.get(print.id) ?? [], settings, print.tone_status);
    values.push(
      print.id,
      state.status,
      JSON.stringify(state.flags),
      state.urgency,
      state.nextCheckDue,
      state.ratePerYear,
      JSON.stringify(state.sparkline),
    );
    const alert = statusChangeAlert(print.tone_status, state);
    if (alert && !open.has(`${print.id} ${alert.kind}`))
      alerts.push(print.id, alert.kind, alert.reason, now);
  }
  const tuples = prints.map(() => '(?, ?, ?, ?, ?, ?, ?)').join(', ');
  await runBound(
    sequelize,
    `UPDATE prints SET tone_status = v.column2, tone_flags = v.column3, tone_urgency = v.column4,
       next_check_due = v.column5, tone_rate_per_year = v.column6, tone_sparkline = v.column7
     FROM (VALUES ${tuples}) AS v WHERE prints.id = v.column1`,
    values,
    transaction,
  );
  if (alerts.length > 0) {
    const alertTuples = Array.from({ length: alerts.length / 4 }, () => '(?, ?, ?, ?)').join(', ');
    await runBound(
      sequelize,
      `INSERT INTO alerts (print_id, kind, reason, opened_at) VALUES ${alertTuples}`,
      alerts,
      transaction,
    );
  }
  return { count: prints.length, lastId };
}

/** `printId kind` of every unacknowledged alert of the batch: one change opens one alert. */
async function openAlertKinds(
  sequelize: Sequelize,
  afterId: number,
  lastId: number,
  transaction: Transaction,
): Promise<Set<string>> {
  const rows = await sequelize.query<{ print_id: number; kind: string }>(
    `SELECT print_id, kind FROM alerts
      WHERE acknowledged_at IS NULL AND print_id > ? AND print_id <= ?`,
    { replacements: [afterId, lastId], type: QueryTypes.SELECT, transaction },
  );
  return new Set(rows.map((row) => `${row.print_id} ${row.kind}`));
}

/** One background re-evaluation at a time; a change during a run queues one more run. */
export class ReevaluationTracker {
  progress: ReevaluationProgress | null = null;
  private running: Promise<void> | null = null;
  private again = false;

  constructor(
    private readonly sequelize: Sequelize,
    /** Runs after each finished run (the search index re-reads every tone status). */
    private readonly afterRun: () => Promise<void> = async () => {},
    /** Shutdown waits for a run in progress before the database closes. */
    private readonly background?: BackgroundWork,
  ) {}

  /** Starts (or queues) a run and returns at once. */
  start(): ReevaluationProgress {
    if (this.running) {
      this.again = true;
      return this.progress!;
    }
    this.progress = {
      status: 'running',
      done: 0,
      total: 0,
      startedAt: new Date().toISOString(),
      finishedAt: null,
    };
    const progress = this.progress;
    this.running = reevaluateAllPrints(this.sequelize, (done, total) => {
      progress.done = done;
      progress.total = total;
    })
      .then(async () => {
        await this.afterRun();
        progress.status = 'done';
      })
      .catch((error: unknown) => {
        progress.status = 'failed';
        console.error('tone re-evaluation failed', error);
      })
      .finally(() => {
        progress.finishedAt = new Date().toISOString();
        this.running = null;
        if (this.again && !this.background?.stopping) {
          this.again = false;
          this.start();
        }
      });
    this.background?.track(this.running);
    return progress;
  }

  /** Resolves when no run is going (tests and shutdown wait on it). */
  async idle(): Promise<void> {
    while (this.running) await this.running;
  }
}
