import { boundedEditDistance } from '../../../shared/domain/edit-distance';

/** How many recent words stay unsorted before they are merged into the sorted list. */
const RECENT_LIMIT = 2048;

/**
 * Every indexed word with a dense id. Prefix search walks a sorted copy (binary search to
 * the first match); words added since the last merge sit in a short unsorted list, so a
 * new word never re-sorts the whole vocabulary during a request.
 */
export class Vocabulary {
  private ids = new Map<string, number>();
  readonly words: string[] = [];
  private sorted: string[] = [];
  private recent: string[] = [];
  /** Words without digits, by length: the only candidates for typo matching. */
  private byLength: string[][] = [];

  get size(): number {
    return this.words.length;
  }

  idOf(word: string): number | undefined {
    return this.ids.get(word);
  }

  /** The id of `word`, adding it when new. */
  intern(word: string): number {
    const known = this.ids.get(word);
    if (known !== undefined) return known;
    const id = this.words.length;
    this.ids.set(word, id);
    this.words.push(word);
    this.recent.push(word);
    if (!/\d/.test(word)) (this.byLength[word.length] ??= []).push(word);
    if (this.recent.length > RECENT_LIMIT) this.merge();
    return id;
  }

  /** Sorts once after a bulk build instead of merging in steps. */
  merge(): void {
    if (!this.recent.length) return;
    this.sorted =
      this.sorted.length === 0 ? this.recent.sort() : mergeSorted(this.sorted, this.recent.sort());
    this.recent = [];
  }

  /** Ids of the words starting with `prefix` (the word itself included). */
  withPrefix(prefix: string): number[] {
    const found: number[] = [];
    let low = 0;
    let high = this.sorted.length;
    while (low < high) {
      const mid = (low + high) >>> 1;
      if (this.sorted[mid]! < prefix) low = mid + 1;
      else high = mid;
    }
    for (let i = low; i < this.sorted.length && this.sorted[i]!.startsWith(prefix); i += 1)
      found.push(this.ids.get(this.sorted[i]!)!);
    for (const word of this.recent) if (word.startsWith(prefix)) found.push(this.ids.get(word)!);
    return found;
  }

  /** Words within `max` edits of `word` (digits never match fuzzily), with their distance. */
  near(word: string, max: number): Array<{ id: number; distance: number }> {
    const found: Array<{ id: number; distance: number }> = [];
    for (let length = word.length - max; length <= word.length + max; length += 1) {
      for (const candidate of this.byLength[length] ?? []) {
        const distance = boundedEditDistance(word, candidate, max);
        if (distance <= max && distance > 0) found.push({ id: this.ids.get(candidate)!, distance });
      }
    }
    return found;
  }

  /** The words in id order, for a snapshot. */
  toJSON(): string[] {
    return this.words;
  }

  static fromWords(words: readonly string[]): Vocabulary {
    const vocabulary = new Vocabulary();
    for (const word of words) vocabulary.intern(word);
    vocabulary.merge();
    return vocabulary;
  }
}

function mergeSorted(a: string[], b: string[]): string[] {
  const out = new Array<string>(a.length + b.length);
  let i = 0;
  let j = 0;
  let k = 0;
  while (i < a.length && j < b.length) out[k++] = a[i]! <= b[j]! ? a[i++]! : b[j++]!;
  while (i < a.length) out[k++] = a[i++]!;
  while (j < b.length) out[k++] = b[j++]!;
  return out;
}
