import { join } from 'node:path';
import type { Config } from '../../config';
import { DiskStorage } from './disk-storage';
import type { ObjectStorage } from './storage';

/**
 * The driver `STORAGE_URL` chose. The S3 driver module is imported only when asked for, so
 * the disk setup under tsx and in tests never loads the AWS SDK (the compiled build bundles
 * both and imports the SDK at start, about 0.2 s; no S3 client is made on disk).
 */
export async function openStorage(
  config: Pick<Config, 'storage' | 'uploadsDir' | 'dataDir'>,
): Promise<ObjectStorage> {
  if (config.storage.kind === 'disk') return new DiskStorage(config.uploadsDir);
  const { S3Storage } = await import('./s3-storage');
  return new S3Storage(config.storage, join(config.dataDir, 'object-cache'));
}
