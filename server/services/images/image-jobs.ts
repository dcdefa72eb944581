import type { Sequelize } from 'sequelize';
import { dialectOf } from '../../db/dialect';
import { writeTransaction } from '../../db/write-transaction';
import { Asset } from '../../models';
import type { BackgroundWork } from '../background';
import type { JobQueue } from '../jobs/job-queue';
import { waitUntil } from '../jobs/wait-until';
import type { ObjectStorage } from '../storage/storage';
import type { DerivativeStore } from './derivative-store';
import { writeDerivative } from './derivatives';
import { writeTiles } from './tiles';

/** Progress an asset reports after each stage (the thumbnail is made before the answer). */
export const PROGRESS = { thumbnail: 34, web: 67, tiles: 100 } as const;

/**
 * Background work after an upload: the web image, then the deep-zoom tiles. An upload asks
 * for them through the job queue (`request`: the `image-derivatives` job, keyed by the
 * original's SHA-256, so one original waits in the queue once), and whichever instance
 * takes the job reads the original from storage and makes them in its own cache. What the
 * other instances see is the asset's status and progress, written to every asset that
 * shares the original (the record's page polls for it); an instance whose cache lacks a
 * derivative makes it when it is asked for one (`enqueue`). One original at a time per
 * instance, so a batch of 29-megapixel scans does not starve the requests of 2 cores.
 */
export class ImageJobs {
  private queue: Promise<void> = Promise.resolve();
  private pending = 0;
  private readonly inFlight = new Map<string, Promise<void>>();

  constructor(
    private readonly sequelize: Sequelize,
    private readonly storage: ObjectStorage,
    private readonly derivatives: DerivativeStore,
    private readonly background: BackgroundWork,
    private readonly jobs: JobQueue,
  ) {}

  /** Asks for an original's derivatives through the job queue; returns once queued. */
  request(sha256: string): Promise<void> {
    return this.jobs.send('image-derivatives', { sha256 }, sha256);
  }

  /**
   * The `image-derivatives` job. An original no asset waits for any more (another instance
   * made its derivatives since, or its images were deleted) is left alone. A failure is on
   * the asset (`failed`, with the message) and not tried again until a new upload.
   */
  async runJob(sha256: string): Promise<void> {
    // A second job for the same original (queued again at a start while the first ran)
    // waits here for the first, then finds nothing left to do.
    await dialectOf(this.sequelize).exclusiveAcrossInstances(
      this.sequelize,
      `derivatives:${sha256}`,
      async () => {
        if (await this.waitedFor(sha256)) await this.enqueue(sha256).catch(() => undefined);
      },
    );
    // Stopped between stages: on PostgreSQL another instance may carry on now.
    if (
      this.background.stopping &&
      dialectOf(this.sequelize).severalInstances &&
      (await this.waitedFor(sha256))
    ) {
      await this.request(sha256).catch(() => undefined);
    }
  }

  /** Makes what this instance's cache lacks of an original's derivatives; resolves when they exist. */
  enqueue(sha256: string): Promise<void> {
    const known = this.inFlight.get(sha256);
    if (known) return known;
    this.pending += 1;
    const job = this.queue.then(() => this.process(sha256));
    const tracked = this.background.track(job).finally(() => {
      this.pending -= 1;
      this.inFlight.delete(sha256);
    });
    this.inFlight.set(sha256, tracked);
    this.queue = tracked.catch(() => undefined);
    return tracked;
  }

  /** Resolves once nothing is being made in this instance (a delete waits on it). */
  async idleHere(): Promise<void> {
    while (this.pending > 0) await this.queue;
  }

  /**
   * Resolves once no asset waits for its derivatives, whichever instance makes them (tests
   * wait on it); polls the assets.
   */
  idle(): Promise<void> {
    return waitUntil(async () => {
      await this.idleHere();
      return (await Asset.count({ where: { status: 'processing' } })) === 0;
    }, 'Image derivatives were still being made');
  }

  /** Queues again the originals a stopped server left half-made (the key keeps them once). */
  async resume(): Promise<void> {
    const waiting = await Asset.findAll({
      where: { status: 'processing' },
      attributes: ['sha256'],
    });
    for (const sha256 of new Set(waiting.map((asset) => asset.sha256))) {
      await this.request(sha256);
    }
  }

  private async waitedFor(sha256: string): Promise<boolean> {
    return (await Asset.count({ where: { sha256, status: 'processing' } })) > 0;
  }

  private async process(sha256: string): Promise<void> {
    // Stopping: the asset stays `processing` and resume() takes it up at the next start.
    if (this.background.stopping) return;
    const sample = await Asset.findOne({ where: { sha256 } });
    if (!sample) return;
    const source = { hasProfile: sample.hasProfile };
    try {
      const input = await this.storage.localPath(sample.storageKey);
      await this.derivatives.prepare(sha256);
      // The upload made the thumbnail; an instance with an empty cache makes its own.
      for (const size of ['thumbnail', 'web'] as const) {
        if (!this.derivatives.has(sha256, size)) {
          await writeDerivative(input, source, size, this.derivatives.fileOf(sha256, size));
        }
      }
      if (sample.status !== 'ready') await this.report(sha256, { progress: PROGRESS.web });
      if (this.background.stopping) return;
      if (!this.derivatives.has(sha256, 'tiles')) {
        await writeTiles(input, source, this.derivatives, sha256);
      }
      await this.report(sha256, { progress: PROGRESS.tiles, status: 'ready' });
    } catch (error) {
      await this.report(sha256, { status: 'failed', error: (error as Error).message });
      throw error;
    }
  }

  private report(
    sha256: string,
    values: Partial<Pick<Asset, 'progress' | 'status' | 'error'>>,
  ): Promise<unknown> {
    return writeTransaction(this.sequelize, (transaction) =>
      Asset.update(values, { where: { sha256 }, transaction }),
    );
  }
}
