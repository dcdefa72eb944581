import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, rename, rm, stat, unlink } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { randomUUID } from 'node:crypto';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  S3Client,
  type S3ClientConfig,
} from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import { LocalFileCache } from './local-file-cache';
import { StorageUnavailable, type ObjectStorage, type StoredObject } from './storage';

export interface S3Location {
  bucket: string;
  /** Key prefix without leading or trailing slash; '' for the bucket's root. */
  prefix: string;
  /** An S3-compatible server's address (path-style addressing); null for AWS itself. */
  endpoint: string | null;
  region: string;
}

/** 16 MiB parts: a 500 MB scan is 32 parts, well under S3's 10,000-part limit. */
const PART_BYTES = 16 * 1024 * 1024;
/** Local copies for image work: room for ten of the largest uploads (`UPLOAD_LIMIT_MB` 500). */
const CACHE_BYTES = 5 * 1024 ** 3;

export interface S3StorageOptions {
  /** Byte budget of the local copies (`localPath`); the least recently used go first. */
  cacheBytes?: number;
  /** Settings for the SDK client over the ones from the location (tests: credentials). */
  client?: S3ClientConfig;
}

/**
 * Objects in an S3 bucket under a prefix. Credentials come from the SDK's usual chain
 * (`AWS_ACCESS_KEY_ID`/`AWS_SECRET_ACCESS_KEY`, profiles, instance roles). `localPath`
 * downloads an object once into this instance's cache directory and reuses it.
 */
export class S3Storage implements ObjectStorage {
  readonly client: S3Client;
  readonly cache: LocalFileCache;
  private readonly cacheRoot: string;
  private readonly downloads = new Map<string, Promise<string>>();

  constructor(
    private readonly location: S3Location,
    cacheDir: string,
    options: S3StorageOptions = {},
  ) {
    this.cacheRoot = resolve(cacheDir);
    this.cache = new LocalFileCache(this.cacheRoot, options.cacheBytes ?? CACHE_BYTES);
    this.client = new S3Client({
      region: location.region,
      ...(location.endpoint ? { endpoint: location.endpoint, forcePathStyle: true } : {}),
      ...options.client,
    });
  }

  /** The object key of a storage key; refuses keys that would leave the prefix. */
  objectKey(key: string): string {
    const parts = key.split('/');
    if (!key || parts.some((part) => part === '' || part === '.' || part === '..'))
      throw new Error(`storage key outside the prefix: ${key}`);
    return this.location.prefix ? `${this.location.prefix}/${key}` : key;
  }

  async putFile(key: string, localPath: string): Promise<{ stored: boolean }> {
    if (await this.stat(key)) {
      await unlink(localPath);
      return { stored: false };
    }
    const upload = new Upload({
      client: this.client,
      params: {
        Bucket: this.location.bucket,
        Key: this.objectKey(key),
        Body: createReadStream(localPath),
      },
      partSize: PART_BYTES,
      queueSize: 2,
    });
    await upload.done().catch((error: unknown) => {
      throw unavailable(error);
    });
    await unlink(localPath);
    return { stored: true };
  }

  async get(key: string): Promise<Readable> {
    return this.body(key);
  }

  async getRange(key: string, start: number, end: number): Promise<Readable> {
    return this.body(key, `bytes=${start}-${end}`);
  }

  async stat(key: string): Promise<StoredObject | null> {
    const command = new HeadObjectCommand({
      Bucket: this.location.bucket,
      Key: this.objectKey(key),
    });
    try {
      const head = await this.client.send(command);
      return { key, bytes: head.ContentLength ?? 0 };
    } catch (error) {
      if (isNotFound(error)) return null;
      throw unavailable(error);
    }
  }

  async delete(key: string): Promise<void> {
    await this.client
      .send(new DeleteObjectCommand({ Bucket: this.location.bucket, Key: this.objectKey(key) }))
      .catch((error: unknown) => {
        throw unavailable(error);
      });
    const file = this.cacheFile(key);
    this.cache.forget(file);
    await rm(file, { force: true });
  }

  /** A cached copy on this machine, downloaded on first use (one download per key at a time). */
  async localPath(key: string): Promise<string> {
    const file = this.cacheFile(key);
    if (await this.cache.has(file)) return file;
    let download = this.downloads.get(key);
    if (!download) {
      download = this.download(key, file).finally(() => this.downloads.delete(key));
      this.downloads.set(key, download);
    }
    return download;
  }

  private async download(key: string, file: string): Promise<string> {
    await mkdir(dirname(file), { recursive: true });
    const partial = `${file}.${randomUUID()}.partial`;
    try {
      await pipeline(await this.body(key), createWriteStream(partial));
      await rename(partial, file);
      await this.cache.added(file, (await stat(file)).size);
      return file;
    } catch (error) {
      await rm(partial, { force: true });
      throw error;
    }
  }

  private cacheFile(key: string): string {
    const file = resolve(join(this.cacheRoot, this.objectKey(key)));
    if (!file.startsWith(this.cacheRoot + sep))
      throw new Error(`storage key outside the cache: ${key}`);
    return file;
  }

  private async body(key: string, range?: string): Promise<Readable> {
    const command = new GetObjectCommand({
      Bucket: this.location.bucket,
      Key: this.objectKey(key),
      Range: range,
    });
    const answer = await this.client.send(command).catch((error: unknown) => {
      throw unavailable(error);
    });
    return answer.Body as Readable;
  }
}

/**
 * A failure of the service itself (no answer, refused credentials, 5xx) as
 * `StorageUnavailable`; a request the service understood and refused (404, 416) as it came.
 */
function unavailable(error: unknown): unknown {
  const failure = error as { $metadata?: { httpStatusCode?: number }; code?: string };
  const fromService = failure.$metadata !== undefined || NETWORK.has(failure.code ?? '');
  const status = failure.$metadata?.httpStatusCode;
  if (fromService && (status === undefined || status === 401 || status === 403 || status >= 500)) {
    return new StorageUnavailable(`object storage: ${(error as Error).message}`, { cause: error });
  }
  return error;
}

const NETWORK = new Set(['ECONNREFUSED', 'ECONNRESET', 'ENOTFOUND', 'EAI_AGAIN', 'ETIMEDOUT']);

function isNotFound(error: unknown): boolean {
  const failure = error as { name?: string; $metadata?: { httpStatusCode?: number } };
  return (
    failure.name === 'NotFound' ||
    failure.name === 'NoSuchKey' ||
    failure.$metadata?.httpStatusCode === 404
  );
}
