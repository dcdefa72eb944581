import { existsSync } from 'node:fs';
import { mkdir, rm } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import type { DerivativeSize } from './derivatives';

/**
 * Derivatives (thumbnail, web image, IIIF tiles) on local disk, one directory per
 * original's SHA-256. They are a cache: every file here can be remade from the original.
 */
export class DerivativeStore {
  readonly root: string;

  constructor(uploadsDir: string) {
    this.root = resolve(uploadsDir, 'derivatives');
  }

  dirOf(sha256: string): string {
    if (!/^[0-9a-f]{64}$/.test(sha256)) throw new Error('not a SHA-256 hex digest');
    return join(this.root, sha256);
  }

  fileOf(sha256: string, size: DerivativeSize): string {
    return join(this.dirOf(sha256), `${size}.jpg`);
  }

  /** The directory that holds `info.json` and the tile tree. */
  tilesOf(sha256: string): string {
    return join(this.dirOf(sha256), 'iiif');
  }

  has(sha256: string, kind: DerivativeSize | 'tiles'): boolean {
    return existsSync(
      kind === 'tiles' ? join(this.tilesOf(sha256), 'info.json') : this.fileOf(sha256, kind),
    );
  }

  async prepare(sha256: string): Promise<void> {
    await mkdir(this.dirOf(sha256), { recursive: true });
  }

  async remove(sha256: string): Promise<void> {
    await rm(this.dirOf(sha256), { recursive: true, force: true });
  }
}
