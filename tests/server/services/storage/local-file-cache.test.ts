import { existsSync, mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { LocalFileCache } from '../../../../server/services/storage/local-file-cache';

let root: string;
let clock: number;
const now = () => clock;

beforeEach(() => {
  root = mkdtempSync(join(tmpdir(), 'printwarden-cache-'));
  clock = 1_000_000;
});
afterEach(() => rmSync(root, { recursive: true, force: true }));

/** A copy of `bytes` bytes as a download leaves it. */
function copy(name: string, bytes: number): string {
  const file = join(root, name);
  writeFileSync(file, Buffer.alloc(bytes, 1));
  return file;
}

describe('LocalFileCache', () => {
  it('removes the least recently used copies once the budget is passed', async () => {
    const cache = new LocalFileCache(root, 250, 0, now);
    const a = copy('a', 100);
    const b = copy('b', 100);
    await cache.added(a, 100);
    await cache.added(b, 100);
    expect(await cache.has(a)).toBe(true); // a is now the more recent of the two
    const c = copy('c', 100);
    await cache.added(c, 100);
    expect([existsSync(a), existsSync(b), existsSync(c)]).toEqual([true, false, true]);
    expect(cache.bytes).toBe(200);
    expect(await cache.has(b)).toBe(false);
  });

  it('keeps copies handed out within the grace time, over budget for a while', async () => {
    const cache = new LocalFileCache(root, 150, 60_000, now);
    const a = copy('a', 100);
    await cache.added(a, 100);
    clock += 30_000;
    const b = copy('b', 100);
    await cache.added(b, 100);
    expect([existsSync(a), existsSync(b)]).toEqual([true, true]);
    clock += 31_000; // a is now 61 s old; b 31 s
    const c = copy('c', 10);
    await cache.added(c, 10);
    expect([existsSync(a), existsSync(b), existsSync(c)]).toEqual([false, true, true]);
    expect(cache.bytes).toBe(110);
  });

  it('counts copies an earlier run left, oldest first, and removes half-written ones', async () => {
    mkdirSync(join(root, 'originals/ab'), { recursive: true });
    const old = copy('originals/ab/old', 100);
    const newer = copy('originals/ab/newer', 100);
    utimesSync(old, 1000, 1000);
    utimesSync(newer, 2000, 2000);
    const partial = copy('originals/ab/x.1234.partial', 50);
    const cache = new LocalFileCache(root, 250, 0, now);
    const fresh = copy('fresh', 100);
    await cache.added(fresh, 100);
    expect(existsSync(partial)).toBe(false);
    expect([existsSync(old), existsSync(newer), existsSync(fresh)]).toEqual([false, true, true]);
    expect(cache.bytes).toBe(200);
  });

  it('forgets a copy whose file went away behind its back', async () => {
    const cache = new LocalFileCache(root, 1000, 0, now);
    const a = copy('a', 100);
    await cache.added(a, 100);
    rmSync(a);
    expect(await cache.has(a)).toBe(false);
    expect(cache.bytes).toBe(0);
  });
});
