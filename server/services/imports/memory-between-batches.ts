import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';

/**
 * A long import allocates far more than it keeps: each batch's rows, statements and index
 * documents live across the batch's awaits, are promoted to the old generation and die there.
 * V8 lets that garbage grow to a multiple of what is live before collecting it, so a 50,000-
 * row import peaked at about 1.7 times the resident memory of a 10,000-row one while what
 * it kept grew by a tenth. Between committed batches this asks for a full collection when
 * the heap has grown well past what the last one kept: a few collections per import.
 *
 * `gc` is V8's own: `--expose-gc` set through `v8.setFlagsFromString` adds it to contexts
 * made afterwards, so one new context hands it over. Node warns that flags changed after
 * start may behave unpredictably; this one only adds a function. Without it, nothing is done.
 */
const collect: (() => void) | null = (() => {
  try {
    setFlagsFromString('--expose-gc');
    return runInNewContext('gc') as () => void;
  } catch {
    return null;
  }
})();

/**
 * Growth past the last collection's live heap that calls for another (bytes). Measured on
 * 10,000 then 50,000 rows: 32 MB gave peaks of 317 and 409 MB (4 and 18 collections), 64 MB
 * 337 and 424 MB, none 359 and 681 MB; the import took no longer.
 */
const ALLOWED_GROWTH = 32 * 1024 * 1024;

export class HeapBetweenBatches {
  private kept: number;

  /**
   * Starts from a collection, so the allowance counts from what is live: a heap measured
   * full of earlier garbage would let the import's own garbage grow unchecked until V8's
   * next collection dropped below it.
   */
  constructor() {
    collect?.();
    this.kept = process.memoryUsage().heapUsed;
  }

  /** Called after a batch commits: collects when the heap grew past the allowance. */
  settle(): void {
    if (!collect) return;
    const used = process.memoryUsage().heapUsed;
    // V8 collected on its own since: count from the lower heap.
    if (used < this.kept) this.kept = used;
    if (used - this.kept < ALLOWED_GROWTH) return;
    collect();
    this.kept = process.memoryUsage().heapUsed;
  }
}
