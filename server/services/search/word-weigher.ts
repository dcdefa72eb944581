import { normalizeWord, scanWords } from '../../../shared/domain/search-words';
import type { Vocabulary } from './vocabulary';
import { fieldNorm, TEXT_FIELDS, wordWeight, type TextField } from './weights';

/** Where a word's posting goes: words every reader matches, place words, private marks. */
export const OPEN = 0;
export const PLACE = 1;
export const RESTRICTED = 2;
export type PostingKind = typeof OPEN | typeof PLACE | typeof RESTRICTED;

const kindOf = (field: TextField): PostingKind =>
  field === 'place' ? PLACE : field === 'privateMarks' ? RESTRICTED : OPEN;

/** Written words seen this many times over are forgotten and looked up again. */
const REMEMBERED_SPELLINGS = 1_000_000;

/**
 * The weight of each word of a document, summed over its fields with BM25's saturating
 * term frequency (`wordWeight`), by vocabulary id. A build weighs 100,000 documents of
 * about a hundred words each, so the work per word is one lookup of the word as written
 * (remembered with its id) and arithmetic on arrays indexed by id: no maps keyed by
 * normalised words, no arrays of words per field.
 */
export class WordWeigher {
  /** Each word as written → its vocabulary id (-1: normalises to nothing). */
  private readonly idsByWritten = new Map<string, number>();
  /** Occurrences per word id in the field being read; zero between fields. */
  private counts = new Int32Array(1024);
  /** Summed weight per word id and kind in the document being read; zero between documents. */
  private sums = [new Float64Array(1024), new Float64Array(1024), new Float64Array(1024)];
  /** Word ids of the field being read, and of the document per kind, by first appearance. */
  private readonly fieldWords: number[] = [];
  private readonly documentWords: number[][] = [[], [], []];
  private fieldLength = 0;
  private readonly visit = (written: string): void => {
    const id = this.idOf(written);
    if (id < 0) return;
    this.fieldLength += 1;
    const count = this.counts[id]!;
    this.counts[id] = count + 1;
    if (count === 0) this.fieldWords.push(id);
  };

  constructor(readonly vocabulary: Vocabulary) {}

  /** Calls `emit` once per word of the document and kind, in order of first appearance. */
  weigh(
    text: Partial<Record<TextField, string>>,
    emit: (kind: PostingKind, word: number, weight: number) => void,
  ): void {
    const { fieldWords } = this;
    for (const field of TEXT_FIELDS) {
      const value = text[field];
      if (!value) continue;
      this.fieldLength = 0;
      fieldWords.length = 0;
      scanWords(value, this.visit);
      // Read after the scan: a new word may have grown the arrays.
      const counts = this.counts;
      const kind = kindOf(field);
      const sums = this.sums[kind]!;
      const seen = this.documentWords[kind]!;
      const norm = fieldNorm(field, this.fieldLength);
      for (const word of fieldWords) {
        // Weights are positive, so a zero sum means the word is new to this document.
        const sum = sums[word]!;
        if (sum === 0) seen.push(word);
        sums[word] = sum + wordWeight(field, counts[word]!, norm);
        counts[word] = 0;
      }
    }
    for (let kind = OPEN; kind <= RESTRICTED; kind += 1) {
      const sums = this.sums[kind]!;
      const seen = this.documentWords[kind]!;
      for (const word of seen) {
        emit(kind as PostingKind, word, sums[word]!);
        sums[word] = 0;
      }
      seen.length = 0;
    }
  }

  private idOf(written: string): number {
    const known = this.idsByWritten.get(written);
    if (known !== undefined) return known;
    const word = normalizeWord(written);
    const id = word ? this.vocabulary.intern(word) : -1;
    if (this.idsByWritten.size >= REMEMBERED_SPELLINGS) this.idsByWritten.clear();
    this.idsByWritten.set(written, id);
    if (id >= this.counts.length) this.grow(id);
    return id;
  }

  private grow(id: number): void {
    const size = Math.max(id + 1, this.counts.length * 2);
    const counts = new Int32Array(size);
    counts.set(this.counts);
    this.counts = counts;
    this.sums = this.sums.map((old) => {
      const sums = new Float64Array(size);
      sums.set(old);
      return sums;
    });
  }
}
