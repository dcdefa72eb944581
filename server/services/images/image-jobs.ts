import type { Sequelize } from 'sequelize';
import { writeTransaction } from '../../db/write-transaction';
import { Asset } from '../../models';
import type { BackgroundWork } from '../background';
import type { ObjectStorage } from '../storage/storage';
import type { DerivativeStore } from './derivative-store';
import { writeDerivative } from './derivatives';
import { writeTiles } from './tiles';

/** Progress an asset reports after each stage (the thumbnail is made before the answer). */
export const PROGRESS = { thumbnail: 34, web: 67, tiles: 100 } as const;

/**
 * Background work after an upload: the web image, then the deep-zoom tiles. One job at
 * a time, so a batch of 29-megapixel scans does not starve the requests of 2 cores.
 * Progress is written to every asset that shares the original, and the record's page
 * polls for it.
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
  ) {}

  /** Queues the rest of an original's derivatives; resolves when they exist. */
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

  /** Resolves once nothing is queued (tests and the demo seed wait on it). */
  async idle(): Promise<void> {
    while (this.pending > 0) await this.queue;
  }

  /** Re-queues assets left half-made by a stopped server. */
  async resume(): Promise<void> {
    const waiting = await Asset.findAll({
      where: { status: 'processing' },
      attributes: ['sha256'],
    });
    for (const sha256 of new Set(waiting.map((asset) => asset.sha256))) {
      void this.enqueue(sha256).catch(() => undefined);
    }
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
