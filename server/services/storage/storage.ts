import type { Readable } from 'node:stream';

/** What is known about a stored object without reading it. */
export interface StoredObject {
  key: string;
  bytes: number;
}

/**
 * Where originals live: put, get as a stream, ranged read, stat, delete. `openStorage`
 * picks the driver: `DiskStorage` (the default) or `S3Storage`, which answers `localPath`
 * with a copy in its local cache.
 */
export interface ObjectStorage {
  /** Moves a finished local file in under `key`; keeps the stored copy when one exists. */
  putFile(key: string, localPath: string): Promise<{ stored: boolean }>;
  /** The whole object as a stream. */
  get(key: string): Promise<Readable>;
  /** Bytes `start`..`end` inclusive (as in an HTTP Range header). */
  getRange(key: string, start: number, end: number): Promise<Readable>;
  /** Size of the object, or null when it is missing. */
  stat(key: string): Promise<StoredObject | null>;
  delete(key: string): Promise<void>;
  /** A path on this machine that image libraries can open. */
  localPath(key: string): Promise<string>;
}

/** Originals are named by their SHA-256 (lower-case hex), never by a client's file name. */
export function originalKey(sha256: string): string {
  if (!/^[0-9a-f]{64}$/.test(sha256)) throw new Error('not a SHA-256 hex digest');
  return `originals/${sha256.slice(0, 2)}/${sha256.slice(2, 4)}/${sha256}`;
}

/**
 * The storage of originals did not answer, or refused this server (network, credentials,
 * a server-side fault): answered as 503, not as a missing file.
 */
export class StorageUnavailable extends Error {
  override name = 'StorageUnavailable';
}
