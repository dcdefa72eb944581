import SearchableMap from 'minisearch/SearchableMap';
import { boundedEditDistance } from '../../../shared/domain/edit-distance';

/**
 * Every indexed word with a dense id. The words live in MiniSearch's radix tree
 * (`SearchableMap`), which answers prefix walks and bounded-edit lookups without scanning
 * the vocabulary; the dense ids index the compact postings beside it.
 */
export class Vocabulary {
  private tree = new SearchableMap<number>();
  /** The same ids by exact word: a hash lookup is several times cheaper than the tree's walk. */
  private ids = new Map<string, number>();
  readonly words: string[] = [];

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
    this.tree.set(word, id);
    this.ids.set(word, id);
    this.words.push(word);
    return id;
  }

  /** Kept for the bulk build's call: the radix tree needs no sorting step. */
  merge(): void {}

  /** Ids of the words starting with `prefix` (the word itself included). */
  withPrefix(prefix: string): number[] {
    return [...this.tree.atPrefix(prefix).values()];
  }

  /**
   * Words within `max` edits of `word`, with their distance; digits never match fuzzily.
   * The tree counts Levenshtein edits, where a swapped pair costs two; we ask it for one
   * more and keep what is within `max` when a swapped pair counts as one edit.
   */
  near(word: string, max: number): Array<{ id: number; distance: number }> {
    const found: Array<{ id: number; distance: number }> = [];
    for (const [candidate, [id]] of this.tree.fuzzyGet(word, max + 1)) {
      if (/\d/.test(candidate)) continue;
      const distance = boundedEditDistance(word, candidate, max);
      if (distance <= max && distance > 0) found.push({ id, distance });
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
    return vocabulary;
  }
}
