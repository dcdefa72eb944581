import { createReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, unlink } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import type { Readable } from 'node:stream';
import type { ObjectStorage, StoredObject } from './storage';

/** Objects as files under one root directory (`UPLOADS_DIR`). */
export class DiskStorage implements ObjectStorage {
  readonly root: string;

  constructor(root: string) {
    this.root = resolve(root);
  }

  /** The file of a key; refuses keys that would leave the root. */
  private pathOf(key: string): string {
    const path = resolve(join(this.root, key));
    if (!path.startsWith(this.root + sep)) throw new Error(`storage key outside the root: ${key}`);
    return path;
  }

  async putFile(key: string, localPath: string): Promise<{ stored: boolean }> {
    const target = this.pathOf(key);
    if (await this.stat(key)) {
      await unlink(localPath);
      return { stored: false };
    }
    await mkdir(dirname(target), { recursive: true });
    await rename(localPath, target);
    return { stored: true };
  }

  async get(key: string): Promise<Readable> {
    return createReadStream(this.pathOf(key));
  }

  async getRange(key: string, start: number, end: number): Promise<Readable> {
    return createReadStream(this.pathOf(key), { start, end });
  }

  async stat(key: string): Promise<StoredObject | null> {
    try {
      const info = await stat(this.pathOf(key));
      return info.isFile() ? { key, bytes: info.size } : null;
    } catch {
      return null;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }

  async localPath(key: string): Promise<string> {
    return this.pathOf(key);
  }
}
