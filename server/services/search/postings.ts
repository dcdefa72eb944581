/**
 * Which documents hold which word, and how strongly. A compact base (every posting of
 * word t at `slots[offsets[t]] … slots[offsets[t + 1] - 1]`, in slot order) built in one
 * pass, plus a small list per word of postings added since; `compact()` folds those in
 * and drops postings of replaced or deleted documents.
 */
export class Postings {
  offsets = new Int32Array(1);
  slots = new Int32Array(0);
  weights = new Float32Array(0);
  delta = new Map<number, { slots: number[]; weights: number[] }>();
  deltaCount = 0;

  /** Appends a posting (slots only ever grow, so each word's list stays in slot order). */
  add(word: number, slot: number, weight: number): void {
    let list = this.delta.get(word);
    if (!list) this.delta.set(word, (list = { slots: [], weights: [] }));
    list.slots.push(slot);
    list.weights.push(weight);
    this.deltaCount += 1;
  }

  /** Number of postings of a word, dead ones included (close enough for weighting). */
  frequency(word: number): number {
    const base = word + 1 < this.offsets.length ? this.offsets[word + 1]! - this.offsets[word]! : 0;
    return base + (this.delta.get(word)?.slots.length ?? 0);
  }

  /**
   * Rebuilds the base from every posting whose slot is still `live`. The base is already in
   * word order and each word's added postings come after its base ones, so two passes (count,
   * then copy) lay out the new base directly: the old and new arrays are the only copies
   * alive at once (a builder of triples and its counting sort held about 28 bytes a posting
   * at the peak; this holds 16).
   */
  compact(wordCount: number, live: (slot: number) => boolean): void {
    const baseWords = this.offsets.length - 1;
    const offsets = new Int32Array(wordCount + 1);
    for (let word = 0; word < wordCount; word += 1) {
      let count = 0;
      if (word < baseWords)
        for (let i = this.offsets[word]!; i < this.offsets[word + 1]!; i += 1)
          if (live(this.slots[i]!)) count += 1;
      const list = this.delta.get(word);
      if (list) for (const slot of list.slots) if (live(slot)) count += 1;
      offsets[word + 1] = offsets[word]! + count;
    }
    const slots = new Int32Array(offsets[wordCount]!);
    const weights = new Float32Array(slots.length);
    let at = 0;
    for (let word = 0; word < wordCount; word += 1) {
      if (word < baseWords)
        for (let i = this.offsets[word]!; i < this.offsets[word + 1]!; i += 1)
          if (live(this.slots[i]!)) {
            slots[at] = this.slots[i]!;
            weights[at] = this.weights[i]!;
            at += 1;
          }
      const list = this.delta.get(word);
      if (list)
        for (let i = 0; i < list.slots.length; i += 1)
          if (live(list.slots[i]!)) {
            slots[at] = list.slots[i]!;
            weights[at] = list.weights[i]!;
            at += 1;
          }
    }
    this.offsets = offsets;
    this.slots = slots;
    this.weights = weights;
    this.delta = new Map();
    this.deltaCount = 0;
  }
}

/** Collects (word, slot, weight) triples, then lays them out by word with a counting sort. */
export class PostingsBuilder {
  private words: Int32Array;
  private slots: Int32Array;
  private weights: Float32Array;
  private length = 0;

  constructor(capacity = 1 << 16) {
    this.words = new Int32Array(Math.max(16, capacity));
    this.slots = new Int32Array(this.words.length);
    this.weights = new Float32Array(this.words.length);
  }

  add(word: number, slot: number, weight: number): void {
    if (this.length === this.words.length) this.grow();
    this.words[this.length] = word;
    this.slots[this.length] = slot;
    this.weights[this.length] = weight;
    this.length += 1;
  }

  /** Replaces `target`'s base with what was collected; stable, so slot order is kept. */
  finishInto(target: Postings, wordCount: number): void {
    const offsets = new Int32Array(wordCount + 1);
    for (let i = 0; i < this.length; i += 1) offsets[this.words[i]! + 1]! += 1;
    for (let w = 0; w < wordCount; w += 1) offsets[w + 1]! += offsets[w]!;
    const next = offsets.slice(0, wordCount);
    const slots = new Int32Array(this.length);
    const weights = new Float32Array(this.length);
    for (let i = 0; i < this.length; i += 1) {
      const at = next[this.words[i]!]!++;
      slots[at] = this.slots[i]!;
      weights[at] = this.weights[i]!;
    }
    target.offsets = offsets;
    target.slots = slots;
    target.weights = weights;
    target.delta = new Map();
    target.deltaCount = 0;
  }

  private grow(): void {
    const size = this.words.length * 2;
    const words = new Int32Array(size);
    words.set(this.words);
    const slots = new Int32Array(size);
    slots.set(this.slots);
    const weights = new Float32Array(size);
    weights.set(this.weights);
    this.words = words;
    this.slots = slots;
    this.weights = weights;
  }
}
