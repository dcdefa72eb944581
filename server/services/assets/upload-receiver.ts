import { createHash, randomUUID } from 'node:crypto';
import { createWriteStream, mkdirSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { Transform } from 'node:stream';
import type { Request } from 'express';
import multer, { type StorageEngine } from 'multer';
import { multipartLimits } from '../../middleware/multipart';

/** A received upload on local disk, hashed while it streamed in. */
export interface ReceivedFile {
  path: string;
  bytes: number;
  sha256: string;
  originalName: string;
}

type MulterFile = Express.Multer.File & { sha256?: string };

/**
 * A multer storage engine that streams each file to a temp file under our own random
 * name (a client's file name never becomes a path) and hashes it on the way, so a
 * 500 MB original is never held in memory nor read twice.
 */
function hashingDiskStorage(tempDir: string): StorageEngine {
  mkdirSync(tempDir, { recursive: true });
  return {
    _handleFile(_req, file, callback) {
      const path = join(tempDir, `${randomUUID()}.upload`);
      const hash = createHash('sha256');
      let bytes = 0;
      const tap = new Transform({
        transform(chunk: Buffer, _encoding, done) {
          hash.update(chunk);
          bytes += chunk.length;
          done(null, chunk);
        },
      });
      pipeline(file.stream, tap, createWriteStream(path))
        .then(() => callback(null, { path, size: bytes, sha256: hash.digest('hex') } as never))
        .catch(async (error: unknown) => {
          await rm(path, { force: true });
          callback(error as Error);
        });
    },
    _removeFile(_req, file, callback) {
      rm(file.path, { force: true }).then(() => callback(null), callback);
    },
  };
}

/** multer for `POST /api/prints/:id/assets`: one `file` part and the `view` field. */
export function assetUpload(tempDir: string, limitMb: number) {
  return multer({
    storage: hashingDiskStorage(tempDir),
    limits: multipartLimits({ fileSize: limitMb * 1024 * 1024, fields: 5, fieldSize: 1024 }),
  }).single('file');
}

/** The file multer left on the request, or null. */
export function receivedFile(req: Request): ReceivedFile | null {
  const file = req.file as MulterFile | undefined;
  if (!file || !file.sha256) return null;
  return {
    path: file.path,
    bytes: file.size,
    sha256: file.sha256,
    originalName: Buffer.from(file.originalname, 'latin1').toString('utf8').slice(0, 255),
  };
}
