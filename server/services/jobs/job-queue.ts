/**
 * Work that must run once however many server instances there are: a fixity check asked
 * for through one instance, the weekly digest, the tone re-evaluation after a settings change. On SQLite (one instance) jobs run in this
 * process, tracked by `BackgroundWork`; on PostgreSQL they go through pg-boss's tables, and
 * whichever instance takes a job first runs it.
 */
export type JobName =
  'fixity-check' | 'tone-digest' | 'tone-reevaluation' | 'image-derivatives' | 'csv-import';

/**
 * Kinds sent with a key (`send`'s third argument): while a job of the kind with that key
 * waits to be taken, sending it again queues nothing. Image derivatives are keyed by the
 * original's SHA-256.
 */
export const KEYED_JOBS: ReadonlySet<JobName> = new Set<JobName>(['image-derivatives']);

export type JobHandler = (data: Record<string, unknown>) => Promise<void>;

export interface JobQueue {
  /** Registers how a kind of job is run; every instance registers every kind at start. */
  handle(name: JobName, handler: JobHandler): Promise<void>;
  /**
   * Queues one job, run once on some instance. A kind in `KEYED_JOBS` names a key: a job
   * with the same key that waits (or, in this process, runs) is not queued again.
   */
  send(name: JobName, data: Record<string, unknown>, key?: string): Promise<void>;
  /** Runs a job at every tick of a cron expression (server time), once per tick. */
  every(name: JobName, cron: string): Promise<void>;
  /** Takes no more jobs and starts no more ticks; jobs running here go on. */
  pause(): Promise<void>;
  /** Closes the queue once the jobs running here have finished (after `BackgroundWork` stops). */
  stop(): Promise<void>;
}
