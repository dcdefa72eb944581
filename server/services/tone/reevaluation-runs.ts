import type { Sequelize, Transaction } from 'sequelize';
import type { ReevaluationProgress } from '../../../shared/types/tone';
import { dialectOf } from '../../db/dialect';
import { writeTransaction } from '../../db/write-transaction';
import type { Logger } from '../../logging/logger';
import type { ToneReevaluation } from '../../models';
import {
  countLivePrints,
  findToneReevaluation,
  insertToneReevaluation,
  saveToneReevaluation,
} from '../../repositories/tone-reevaluation-repository';
import type { BackgroundWork } from '../background';
import type { JobQueue } from '../jobs/job-queue';
import { waitUntil } from '../jobs/wait-until';
import { evaluatePrints, TONE_BATCH } from './evaluate-prints';
import { loadToneSettings } from './settings-store';

/** Progress moves in about this many steps however small the collection. */
const PROGRESS_STEPS = 20;

/**
 * How many prints one range takes. A collection smaller than one batch would jump from 0 to
 * all at once: it is cut in steps, so "done" always counts prints whose new state is
 * committed.
 */
function rangeSize(total: number): number {
  return Math.min(TONE_BATCH, Math.max(1, Math.ceil(total / PROGRESS_STEPS)));
}

/**
 * The collection-wide tone re-evaluation after a settings change, run as the
 * `tone-reevaluation` job. Its state is one database row (`tone_reevaluations`): every
 * instance shows the same progress, and each range of prints commits together with the
 * row's "done up to print n", so a run stopped anywhere keeps its committed ranges and the
 * next job carries on after them. A change during a run sets "again": one more run follows,
 * however many changes came. A job that finds the row not running does nothing, and two
 * jobs on one run share its ranges (each range reads where the last one ended inside its
 * write transaction), so a run is never done twice.
 */
export class ToneReevaluationRuns {
  constructor(
    private readonly sequelize: Sequelize,
    private readonly jobs: JobQueue,
    private readonly background: BackgroundWork,
    private readonly logger: Logger,
  ) {}

  /** Starts a run, or asks for one more after the run going; returns at once. */
  async request(): Promise<ReevaluationProgress> {
    const { run, start } = await writeTransaction(this.sequelize, async (transaction) => {
      const run = await findToneReevaluation(transaction);
      if (run?.status === 'running') {
        run.again = true;
        await saveToneReevaluation(run, transaction);
        return { run, start: false };
      }
      return { run: await this.beginRun(run, transaction), start: true };
    });
    // The settings are saved either way: a run whose job could not be sent (the server is
    // stopping) stays marked running, and `resume()` queues it at the next start.
    if (start) {
      await this.jobs.send('tone-reevaluation', {}).catch((error: unknown) => {
        this.logger.warn({ err: error }, 'The tone re-evaluation could not be queued.');
      });
    }
    return presentRun(run);
  }

  /** The latest run as the settings page shows it; null before the first. */
  async progress(): Promise<ReevaluationProgress | null> {
    const run = await findToneReevaluation();
    return run ? presentRun(run) : null;
  }

  /**
   * At start: a run a shutdown stopped is queued again. On one instance (SQLite) a run
   * still marked running was cut by a crash, so it is queued too; with several, it may be
   * going elsewhere, and the queue gives a job whose instance died to another one.
   */
  async resume(): Promise<void> {
    const several = dialectOf(this.sequelize).severalInstances;
    const cut = await this.change(
      (status) => status === 'stopped' || (status === 'running' && !several),
      { status: 'running' },
    );
    if (cut) await this.jobs.send('tone-reevaluation', {});
  }

  /** The job: ranges until the run (and the one more it may owe) is done, or a shutdown. */
  async run(): Promise<void> {
    // A job sent for a stopped run takes it up where its last range ended.
    await this.change((status) => status === 'stopped', { status: 'running' });
    try {
      while (!this.background.stopping) {
        if (!(await writeTransaction(this.sequelize, (t) => this.nextRange(t)))) return;
      }
      await this.stop();
    } catch (error) {
      await this.change((status) => status === 'running', {
        status: 'failed',
        again: false,
        finishedAt: new Date(),
      });
      throw error;
    }
  }

  /** Resolves once no run is going (tests wait on it); polls the row. */
  idle(): Promise<void> {
    return waitUntil(
      async () => (await findToneReevaluation())?.status !== 'running',
      'The tone re-evaluation was still running',
    );
  }

  /** One range, committed with the row; false when the run has nothing left to do. */
  private async nextRange(transaction: Transaction): Promise<boolean> {
    const run = await findToneReevaluation(transaction);
    if (run?.status !== 'running') return false;
    const settings = await loadToneSettings(transaction);
    const { printIds } = await evaluatePrints(
      this.sequelize,
      settings,
      { afterId: run.afterId, limit: rangeSize(run.total) },
      transaction,
    );
    if (printIds.length > 0) {
      run.done = Math.min(run.done + printIds.length, run.total);
      run.afterId = printIds[printIds.length - 1]!;
      await saveToneReevaluation(run, transaction);
      return true;
    }
    if (run.again) {
      await this.beginRun(run, transaction);
      return true;
    }
    Object.assign(run, { status: 'done', done: run.total, finishedAt: new Date() });
    await saveToneReevaluation(run, transaction);
    return false;
  }

  /** A shutdown came between ranges: the run is marked stopped, its ranges kept. */
  private async stop(): Promise<void> {
    const stopped = await this.change((status) => status === 'running', { status: 'stopped' });
    if (!stopped || !dialectOf(this.sequelize).severalInstances) return;
    // Another instance may go on with it now; if none is up, the next to start takes it.
    await this.jobs.send('tone-reevaluation', {}).catch((error: unknown) => {
      this.logger.warn({ err: error }, 'The stopped re-evaluation could not be queued again.');
    });
  }

  /** Changes the run's row when its status is one `from` accepts; whether it did. */
  private change(
    from: (status: ToneReevaluation['status']) => boolean,
    values: Partial<Pick<ToneReevaluation, 'status' | 'again' | 'finishedAt'>>,
  ): Promise<boolean> {
    return writeTransaction(this.sequelize, async (transaction) => {
      const run = await findToneReevaluation(transaction);
      if (!run || !from(run.status)) return false;
      Object.assign(run, values);
      await saveToneReevaluation(run, transaction);
      return true;
    });
  }

  /** The row set for a new run from the first print (the first row, or one more run). */
  private async beginRun(
    run: ToneReevaluation | null,
    transaction: Transaction,
  ): Promise<ToneReevaluation> {
    const values = {
      status: 'running' as const,
      done: 0,
      total: await countLivePrints(transaction),
      afterId: 0,
      again: false,
      runs: (run?.runs ?? 0) + 1,
      startedAt: new Date(),
      finishedAt: null,
    };
    if (!run) return insertToneReevaluation(values, transaction);
    Object.assign(run, values);
    await saveToneReevaluation(run, transaction);
    return run;
  }
}

function presentRun(run: ToneReevaluation): ReevaluationProgress {
  return {
    status: run.status,
    done: run.done,
    total: run.total,
    startedAt: new Date(run.startedAt).toISOString(),
    finishedAt: run.finishedAt ? new Date(run.finishedAt).toISOString() : null,
  };
}
