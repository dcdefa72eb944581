import PgBoss from 'pg-boss';
import type { Logger } from '../../logging/logger';
import type { BackgroundWork } from '../background';
import { KEYED_JOBS, type JobHandler, type JobName, type JobQueue } from './job-queue';

/**
 * Jobs in PostgreSQL through pg-boss (its own schema, `pgboss`): a job sent by any instance
 * is taken by exactly one, and a schedule fires once per tick however many instances
 * registered it. Every instance is a worker. A job runs inside `BackgroundWork`, so
 * shutdown waits for it before the database closes.
 */
export class PgBossQueue implements JobQueue {
  private readonly workers = new Map<JobName, string>();
  private readonly queues = new Set<JobName>();

  private constructor(
    private readonly boss: PgBoss,
    private readonly background: BackgroundWork,
    private readonly logger: Logger,
  ) {}

  static async start(url: string, background: BackgroundWork, logger: Logger) {
    const boss = new PgBoss({ connectionString: url, schema: 'pgboss', max: 4 });
    boss.on('error', (error) => logger.error({ err: error }, 'The job queue reported an error.'));
    await boss.start();
    return new PgBossQueue(boss, background, logger);
  }

  /**
   * Makes the kind's queue once (idempotent across instances). A keyed kind's queue has
   * pg-boss's `short` policy: one waiting job per `singletonKey`.
   */
  private async ensureQueue(name: JobName): Promise<void> {
    if (this.queues.has(name)) return;
    await this.boss.createQueue(name, {
      name,
      policy: KEYED_JOBS.has(name) ? 'short' : 'standard',
    });
    this.queues.add(name);
  }

  async handle(name: JobName, handler: JobHandler): Promise<void> {
    await this.ensureQueue(name);
    // One job of a kind at a time on each instance (pg-boss fetches the next one only when
    // the handler has returned): a batch of large scans does not take every core.
    const id = await this.boss.work<Record<string, unknown>>(name, async ([job]) => {
      if (!job) return;
      try {
        await this.background.track(handler(job.data ?? {}));
      } catch (error) {
        this.logger.error({ err: error, job: name }, 'A background job failed.');
        throw error;
      } finally {
        // pg-boss would wait out the rest of its 2 s poll before the next fetch, even with
        // jobs waiting: a demo's or a batch's dozens of derivatives took a minute of gaps.
        const worker = this.workers.get(name);
        if (worker) this.boss.notifyWorker(worker);
      }
    });
    this.workers.set(name, id);
  }

  async send(name: JobName, data: Record<string, unknown>, key?: string): Promise<void> {
    await this.ensureQueue(name);
    // Null when a job with this key already waits (the `short` policy's unique index).
    await this.boss.send(name, data, key === undefined ? {} : { singletonKey: key });
    // This instance looks at once instead of at its next poll; another may still take it.
    const worker = this.workers.get(name);
    if (worker) this.boss.notifyWorker(worker);
  }

  async every(name: JobName, cron: string): Promise<void> {
    await this.boss.schedule(
      name,
      cron,
      {},
      { tz: Intl.DateTimeFormat().resolvedOptions().timeZone },
    );
  }

  async pause(): Promise<void> {
    for (const name of this.workers.keys()) await this.boss.offWork(name);
    this.workers.clear();
  }

  async stop(): Promise<void> {
    await this.pause();
    // A job still running here finishes (shutdown has asked it to stop at a safe point) and
    // is marked done, so no other instance runs it again.
    await this.boss.stop({ graceful: true, wait: true, close: true, timeout: 10_000 });
  }
}
