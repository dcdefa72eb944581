import { createHash, randomBytes } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Readable } from 'node:stream';
import { HeadObjectCommand } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { S3Storage } from '../../../../server/services/storage/s3-storage';
import { originalKey, StorageUnavailable } from '../../../../server/services/storage/storage';
import { startLocalS3, type LocalS3 } from '../../../support/s3-server';

const BUCKET = 'driver-test';
let s3: LocalS3;
let storage: S3Storage;
let work: string;

beforeAll(async () => {
  s3 = await startLocalS3(BUCKET);
  work = mkdtempSync(join(tmpdir(), 'printwarden-s3-driver-'));
  storage = new S3Storage(
    {
      bucket: BUCKET,
      prefix: 'archive/originals-test',
      endpoint: s3.endpoint,
      region: 'us-east-1',
    },
    join(work, 'cache'),
  );
});
afterAll(async () => {
  storage.client.destroy();
  await s3.close();
  rmSync(work, { recursive: true, force: true });
});

async function bytesOf(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

/** A local file of `bytes`, as an upload leaves it, and its storage key. */
function staged(bytes: Buffer): { key: string; path: string } {
  const sha = createHash('sha256').update(bytes).digest('hex');
  const path = join(work, `upload-${randomBytes(4).toString('hex')}`);
  writeFileSync(path, bytes);
  return { key: originalKey(sha), path };
}

/** The size of the object at a full key in the bucket, past the driver; null when missing. */
async function sizeAt(key: string): Promise<number | null> {
  try {
    const head = await storage.client.send(new HeadObjectCommand({ Bucket: BUCKET, Key: key }));
    return head.ContentLength ?? null;
  } catch (error) {
    if ((error as { name?: string }).name === 'NotFound') return null;
    throw error;
  }
}

describe('S3Storage on a local S3-compatible server', () => {
  it('stores a file once under the prefix, removes the local copy, and keeps the first on a second put', async () => {
    const bytes = randomBytes(70_000);
    const first = staged(bytes);
    expect(await storage.putFile(first.key, first.path)).toEqual({ stored: true });
    expect(existsSync(first.path)).toBe(false);
    const second = staged(bytes);
    expect(await storage.putFile(second.key, second.path)).toEqual({ stored: false });
    expect(existsSync(second.path)).toBe(false);
    expect(await sizeAt(`archive/originals-test/${first.key}`)).toBe(70_000);
    expect(await sizeAt(first.key)).toBeNull();
    expect(await storage.stat(first.key)).toEqual({ key: first.key, bytes: 70_000 });
    expect((await bytesOf(await storage.get(first.key))).equals(bytes)).toBe(true);
  });

  it('uploads a file larger than one part in several parts, whole', async () => {
    // 16 MiB parts: 20 MiB goes as two parts through the multipart API.
    const bytes = randomBytes(20 * 1024 * 1024);
    const file = staged(bytes);
    const sent: string[] = [];
    storage.client.middlewareStack.add(
      (next, context) => (args) => {
        sent.push(context.commandName!);
        return next(args);
      },
      { step: 'initialize', name: 'noteCommands' },
    );
    await storage.putFile(file.key, file.path);
    storage.client.middlewareStack.remove('noteCommands');
    expect(sent).toEqual([
      'HeadObjectCommand',
      'CreateMultipartUploadCommand',
      'UploadPartCommand',
      'UploadPartCommand',
      'CompleteMultipartUploadCommand',
    ]);
    expect(await storage.stat(file.key)).toEqual({ key: file.key, bytes: bytes.length });
    const back = await bytesOf(await storage.get(file.key));
    expect(createHash('sha256').update(back).digest('hex')).toBe(
      createHash('sha256').update(bytes).digest('hex'),
    );
  });

  it('reads a byte range equal to the same slice of the file', async () => {
    const bytes = randomBytes(10_000);
    const file = staged(bytes);
    await storage.putFile(file.key, file.path);
    const slice = await bytesOf(await storage.getRange(file.key, 1234, 5677));
    expect(slice.length).toBe(4444);
    expect(slice.equals(bytes.subarray(1234, 5678))).toBe(true);
    expect(
      (await bytesOf(await storage.getRange(file.key, 9999, 9999))).equals(bytes.subarray(9999)),
    ).toBe(true);
  });

  it('answers null for a missing object, and deletes an object and its cached copy', async () => {
    expect(await storage.stat(originalKey('0'.repeat(64)))).toBeNull();
    const bytes = randomBytes(5_000);
    const file = staged(bytes);
    await storage.putFile(file.key, file.path);
    const cached = await storage.localPath(file.key);
    expect(readFileSync(cached).equals(bytes)).toBe(true);
    expect(await storage.localPath(file.key)).toBe(cached);
    const counted = storage.cache.bytes;
    await storage.delete(file.key);
    expect(storage.cache.bytes).toBe(counted - 5_000);
    expect(await storage.stat(file.key)).toBeNull();
    expect(existsSync(cached)).toBe(false);
    await storage.delete(file.key); // deleting what is gone is not an error, as on disk
  });

  it('downloads a cached copy once when asked twice at the same time', async () => {
    const bytes = randomBytes(300_000);
    const file = staged(bytes);
    await storage.putFile(file.key, file.path);
    const [a, b] = await Promise.all([storage.localPath(file.key), storage.localPath(file.key)]);
    expect(a).toBe(b);
    expect(readFileSync(a).equals(bytes)).toBe(true);
  });

  it('refuses keys that would leave the prefix', async () => {
    for (const key of ['../outside', 'originals/../../x', '/absolute', 'a//b', '']) {
      expect(() => storage.objectKey(key)).toThrow(/outside the prefix/);
      const refused = await storage.stat(key).catch((error: unknown) => error);
      expect(refused).not.toBeInstanceOf(StorageUnavailable);
      expect((refused as Error).message).toMatch(/^storage key outside the prefix/);
    }
  });

  it('reports a server that refuses the credentials, instead of calling the object missing', async () => {
    const stranger = new S3Storage(
      { bucket: BUCKET, prefix: '', endpoint: s3.endpoint, region: 'us-east-1' },
      join(work, 'cache-2'),
      { client: { credentials: { accessKeyId: 'SOMEONE', secretAccessKey: 'ELSE' } } },
    );
    const refused = await stranger
      .stat(originalKey('1'.repeat(64)))
      .catch((error: unknown) => error);
    expect(refused).toBeInstanceOf(StorageUnavailable);
    expect((refused as Error).cause).toMatchObject({ $metadata: { httpStatusCode: 403 } });
    stranger.client.destroy();
  });
});
