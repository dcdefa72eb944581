import { join } from 'node:path';
import type { Sequelize } from 'sequelize';
import sharp from 'sharp';
import type { BackgroundWork } from '../background';
import type { JobQueue } from '../jobs/job-queue';
import type { ObjectStorage } from '../storage/storage';
import { DerivativeStore } from './derivative-store';
import { ImageJobs } from './image-jobs';

/** Storage of originals (as `openStorage` chose), the local derivative cache and the background queue, built once. */
export interface ImageServices {
  storage: ObjectStorage;
  derivatives: DerivativeStore;
  jobs: ImageJobs;
  /** Where uploads stream to before they are checked and stored. */
  tempDir: string;
  uploadLimitMb: number;
}

export function createImageServices(
  sequelize: Sequelize,
  config: { uploadsDir: string; uploadLimitMb: number },
  background: BackgroundWork,
  storage: ObjectStorage,
  jobs: JobQueue,
): ImageServices {
  // Each original is decoded once or twice, so libvips's operation cache only holds memory
  // (tens of MB after a large scan) without saving work.
  sharp.cache(false);
  const derivatives = new DerivativeStore(config.uploadsDir);
  return {
    storage,
    derivatives,
    jobs: new ImageJobs(sequelize, storage, derivatives, background, jobs),
    tempDir: join(config.uploadsDir, 'tmp'),
    uploadLimitMb: config.uploadLimitMb,
  };
}
