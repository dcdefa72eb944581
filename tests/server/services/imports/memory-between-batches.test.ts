import { describe, expect, it } from 'vitest';
import { HeapBetweenBatches } from '../../../../server/services/imports/memory-between-batches';

const MB = 1024 * 1024;

describe('the heap between import batches', () => {
  it('starts from a collection, so garbage left before the import does not widen the allowance', () => {
    // About 100 MB made and let go before the import starts (a worker's earlier work).
    let earlier: number[][] | null = Array.from({ length: 1500 }, () => new Array(8192).fill(1.5));
    expect(earlier).toHaveLength(1500);
    earlier = null;
    const before = process.memoryUsage().heapUsed;
    new HeapBetweenBatches();
    expect(before - process.memoryUsage().heapUsed).toBeGreaterThan(70 * MB);
    expect(earlier).toBeNull();
  });

  it('collects once garbage has grown past the allowance, and leaves a small growth alone', () => {
    const heap = new HeapBetweenBatches();
    // Under the allowance: nothing is collected, so garbage made here is still counted.
    const small = Array.from({ length: 40 }, () => new Array(8192).fill(1.5));
    small.length = 0;
    const beforeSmall = process.memoryUsage().heapUsed;
    heap.settle();
    expect(process.memoryUsage().heapUsed).toBeGreaterThanOrEqual(beforeSmall - 2 * MB);
    expect(small).toHaveLength(0);

    // About 120 MB kept alive while made (no collection can free it), then let go.
    let big: number[][] | null = Array.from({ length: 1800 }, () => new Array(8192).fill(1.5));
    const held = big.length;
    big = null;
    const before = process.memoryUsage().heapUsed;
    heap.settle();
    const after = process.memoryUsage().heapUsed;
    expect(held).toBe(1800);
    expect(before - after).toBeGreaterThan(80 * MB);
    expect(big).toBeNull();
  });
});
