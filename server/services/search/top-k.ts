/**
 * The first `k` items in `before` order without sorting them all: a bounded binary heap
 * whose root is the worst kept item, so most candidates are turned away with one compare.
 */
export function topK(
  candidates: Int32Array,
  count: number,
  k: number,
  before: (a: number, b: number) => boolean,
): number[] {
  if (k <= 0) return [];
  if (count <= k * 4) {
    const all = Array.from(candidates.subarray(0, count));
    return all.sort((a, b) => (before(a, b) ? -1 : before(b, a) ? 1 : 0)).slice(0, k);
  }
  const heap: number[] = [];
  // Root holds the item that comes last; a child never comes after its parent.
  const after = (a: number, b: number) => before(b, a);
  for (let i = 0; i < count; i += 1) {
    const item = candidates[i]!;
    if (heap.length < k) {
      heap.push(item);
      siftUp(heap, heap.length - 1, after);
    } else if (before(item, heap[0]!)) {
      heap[0] = item;
      siftDown(heap, 0, after);
    }
  }
  return heap.sort((a, b) => (before(a, b) ? -1 : 1));
}

function siftUp(heap: number[], at: number, after: (a: number, b: number) => boolean): void {
  while (at > 0) {
    const parent = (at - 1) >> 1;
    if (!after(heap[at]!, heap[parent]!)) return;
    [heap[at], heap[parent]] = [heap[parent]!, heap[at]!];
    at = parent;
  }
}

function siftDown(heap: number[], at: number, after: (a: number, b: number) => boolean): void {
  for (;;) {
    const left = at * 2 + 1;
    const right = left + 1;
    let top = at;
    if (left < heap.length && after(heap[left]!, heap[top]!)) top = left;
    if (right < heap.length && after(heap[right]!, heap[top]!)) top = right;
    if (top === at) return;
    [heap[at], heap[top]] = [heap[top]!, heap[at]!];
    at = top;
  }
}
