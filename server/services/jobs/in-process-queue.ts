import { Cron } from 'croner';
import type { Logger } from '../../logging/logger';
import type { BackgroundWork } from '../background';
import type { JobHandler, JobName, JobQueue } from './job-queue';

/** Jobs in this process: one instance per database, as SQLite allows. */
export class InProcessQueue implements JobQueue {
  private readonly handlers = new Map<JobName, JobHandler>();
  private readonly crons: Cron[] = [];
  private paused = false;

  constructor(
    private readonly background: BackgroundWork,
    private readonly logger: Logger,
  ) {}

  async handle(name: JobName, handler: JobHandler): Promise<void> {
    this.handlers.set(name, handler);
  }

  async send(name: JobName, data: Record<string, unknown>): Promise<void> {
    if (this.paused) throw new Error(`The server is stopping; the job "${name}" was not started.`);
    const handler = this.handlers.get(name);
    if (!handler) throw new Error(`No handler for the job "${name}"`);
    void this.background.track(handler(data)).catch((error: unknown) => {
      this.logger.error({ err: error, job: name }, 'A background job failed.');
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
