import { QueryTypes, type Sequelize } from 'sequelize';
import type { ReevaluationProgress } from '../../../shared/types/tone';
import type { BackgroundWork } from '../background';
import { writeTransaction } from '../../db/write-transaction';
import { evaluatePrints, TONE_BATCH } from './evaluate-prints';
import { loadToneSettings } from './settings-store';

/** Progress moves in about this many steps however small the collection. */
const PROGRESS_STEPS = 20;

/**
 * Re-evaluates every live print's tone state after a settings change with the same
 * evaluation as one print after a check (`evaluatePrints`), a range of prints per write
 * transaction (reads and writes of a range in one transaction, so a check logged meanwhile
 * is never overwritten by a stale result). Only prints whose state moved are written and
 * noted as changed (the search index re-reads those after each commit).
 */
export async function reevaluateAllPrints(
  sequelize: Sequelize,
  onProgress: (done: number, total: number) => void = () => undefined,
  /** Asked between ranges: a shutdown stops the run there, every committed range kept. */
  shouldStop: () => boolean = () => false,
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
  const limit = Math.min(TONE_BATCH, Math.max(1, Math.ceil(total / PROGRESS_STEPS)));
  onProgress(0, total);
  for (;;) {
    if (shouldStop()) break;
    const { printIds } = await writeTransaction(sequelize, (transaction) =>
      evaluatePrints(sequelize, settings, { afterId, limit }, transaction),
    );
    if (printIds.length === 0) break;
    done += printIds.length;
    afterId = printIds[printIds.length - 1]!;
    onProgress(Math.min(done, total), total);
  }
  return done;
}

/** One background re-evaluation at a time; a change during a run queues one more run. */
export class ReevaluationTracker {
  progress: ReevaluationProgress | null = null;
  private running: Promise<void> | null = null;
  private again = false;

  constructor(
    private readonly sequelize: Sequelize,
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
    this.running = reevaluateAllPrints(
      this.sequelize,
      (done, total) => {
        progress.done = done;
        progress.total = total;
      },
      () => this.background?.stopping ?? false,
    )
      .then(() => {
        progress.status = progress.done < progress.total ? 'stopped' : 'done';
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
