import { readdir, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';

interface Entry {
  bytes: number;
  /** Order of last use (a counter, so two uses in one millisecond still have an order). */
  order: number;
  usedAt: number;
}

/**
 * Copies of remote objects in one directory, kept under a byte budget: when a new copy
 * takes the total over it, the least recently used copies go, except those handed out in
 * the last `graceMs` (an image job may not have opened its file yet). Every copy can be
 * fetched again, so losing one costs a download, never data.
 */
export class LocalFileCache {
  private readonly entries = new Map<string, Entry>();
  private total = 0;
  private counter = 0;
  private scanned: Promise<void> | null = null;

  constructor(
    readonly root: string,
    private readonly budgetBytes: number,
    private readonly graceMs = 15 * 60_000,
    private readonly now: () => number = Date.now,
  ) {}

  /** Whether a copy is here; marks it used. */
  async has(file: string): Promise<boolean> {
    await this.scan();
    const entry = this.entries.get(file);
    if (!entry) return false;
    try {
      await stat(file);
    } catch {
      this.forget(file);
      return false;
    }
    this.touch(entry);
    return true;
  }

  /** Records a new copy, then makes room. */
  async added(file: string, bytes: number): Promise<void> {
    await this.scan();
    this.forget(file);
    const entry = { bytes, order: 0, usedAt: 0 };
    this.touch(entry);
    this.entries.set(file, entry);
    this.total += bytes;
    await this.evict();
  }

  /** Drops the record of a copy (its file is removed by the caller). */
  forget(file: string): void {
    const entry = this.entries.get(file);
    if (!entry) return;
    this.total -= entry.bytes;
    this.entries.delete(file);
  }

  get bytes(): number {
    return this.total;
  }

  private touch(entry: Entry): void {
    this.counter += 1;
    entry.order = this.counter;
    entry.usedAt = this.now();
  }

  private async evict(): Promise<void> {
    if (this.total <= this.budgetBytes) return;
    const oldestFirst = [...this.entries].sort(([, a], [, b]) => a.order - b.order);
    for (const [file, entry] of oldestFirst) {
      if (this.total <= this.budgetBytes) break;
      if (this.now() - entry.usedAt < this.graceMs) continue;
      this.forget(file);
      await rm(file, { force: true });
    }
  }

  /** Copies left by an earlier run count against the budget; half-written ones go. */
  private scan(): Promise<void> {
    this.scanned ??= (async () => {
      let names: string[];
      try {
        names = await readdir(this.root, { recursive: true });
      } catch {
        return;
      }
      const found: Array<[string, number, number]> = [];
      for (const name of names) {
        const file = join(this.root, name);
        if (file.endsWith('.partial')) {
          await rm(file, { force: true });
          continue;
        }
        const info = await stat(file).catch(() => null);
        if (info?.isFile()) found.push([file, info.size, info.mtimeMs]);
      }
      // Oldest first, so the order counter follows the files' ages; all start outside grace.
      for (const [file, bytes] of found.sort((a, b) => a[2] - b[2])) {
        this.counter += 1;
        this.entries.set(file, { bytes, order: this.counter, usedAt: 0 });
        this.total += bytes;
      }
    })();
    return this.scanned;
  }
}
