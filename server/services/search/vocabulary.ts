import SearchableMap from 'minisearch/SearchableMap';
import { boundedEditDistance } from '../../../shared/domain/edit-distance';
import { SortedWords } from './sorted-words';

const HAS_DIGIT = /\d/;

/**
 * Every indexed word with a dense id. Words of letters live in MiniSearch's radix tree
 * (`SearchableMap`), which answers prefix walks and bounded-edit lookups without scanning
 * the vocabulary; the dense ids index the compact postings beside it.
 *
 * Words with a digit (accession numbers, batch codes, dates) are never matched fuzzily, so
 * they need only prefix walks: they are kept in a sorted list instead. Most belong to one
 * print each, and in the tree they took more than half of the index's heap (50,000 bench
 * prints: 39.8 MB with them in the tree, 17.8 MB with them here).
 */
export class Vocabulary {
  private tree = new SearchableMap<number>();
  private numbers = new SortedWords();
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
    if (HAS_DIGIT.test(word)) this.numbers.add(word, id);
    else this.tree.set(word, id);
    this.ids.set(word, id);
    this.words.push(word);
    return id;
  }

  /** A bulk build's end: the words with a digit are sorted now, not on the first search. */
  merge(): void {
    this.numbers.merge();
  }

  /** Ids of the words starting with `prefix` (the word itself included). */
  withPrefix(prefix: string): number[] {
    // A prefix with a digit starts no word of letters.
    const found = HAS_DIGIT.test(prefix) ? [] : [...this.tree.atPrefix(prefix).values()];
    this.numbers.withPrefix(prefix, found);
    return found;
  }

  /**
   * Words within `max` edits of `word`, with their distance. Words with a digit are not in the
   * tree, so a number never matches fuzzily (12 minutes is not 13).
   * The tree counts Levenshtein edits, where a swapped pair costs two; we ask it for one
   * more and keep what is within `max` when a swapped pair counts as one edit.
   */
  near(word: string, max: number): Array<{ id: number; distance: number }> {
    const found: Array<{ id: number; distance: number }> = [];
    for (const [candidate, [id]] of this.tree.fuzzyGet(word, max + 1)) {
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
    vocabulary.merge();
    return vocabulary;
  }
}
