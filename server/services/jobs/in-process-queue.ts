import { Cron } from 'croner';
import type { Logger } from '../../logging/logger';
import type { BackgroundWork } from '../background';
import type { JobHandler, JobName, JobQueue } from './job-queue';

/** Jobs in this process: one instance per database, as SQLite allows. */
export class InProcessQueue implements JobQueue {
  private readonly handlers = new Map<JobName, JobHandler>();
  private readonly crons: Cron[] = [];
  /** Keys of keyed jobs sent and not yet finished, by kind. */
  private readonly keys = new Map<JobName, Set<string>>();
  private paused = false;

  constructor(
    private readonly background: BackgroundWork,
    private readonly logger: Logger,
  ) {}

  async handle(name: JobName, handler: JobHandler): Promise<void> {
    this.handlers.set(name, handler);
  }

  async send(name: JobName, data: Record<string, unknown>, key?: string): Promise<void> {
    if (this.paused) throw new Error(`The server is stopping; the job "${name}" was not started.`);
    const handler = this.handlers.get(name);
    if (!handler) throw new Error(`No handler for the job "${name}"`);
    const keys = this.keys.get(name) ?? new Set<string>();
    this.keys.set(name, keys);
    if (key !== undefined) {
      if (keys.has(key)) return;
      keys.add(key);
    }
    void this.background
      .track(handler(data))
      .catch((error: unknown) => {
        this.logger.error({ err: error, job: name }, 'A background job failed.');
      })
      .finally(() => {
        if (key !== undefined) keys.delete(key);
      });
  }

  async every(name: JobName, cron: string): Promise<void> {
    // `protect`: a tick that comes while the last run is still going is skipped.
    this.crons.push(new Cron(cron, { protect: true }, () => this.send(name, {})));
  }

  async pause(): Promise<void> {
    for (const cron of this.crons) cron.stop();
    this.paused = true;
  }

  async stop(): Promise<void> {
    await this.pause();
  }
}
