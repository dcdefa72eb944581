import type { Vocabulary } from './vocabulary';

/** One indexed word a typed word stands for, and how much a match through it counts. */
export interface Expansion {
  word: number;
  factor: number;
}

/**
 * Word prefixes beyond this many add cost and no useful matches. A prefix with a digit has
 * no cap: it is an accession number's start, and "2024.0" must find every 2024 print, not
 * the first 50 (each such word holds about one print, so the cost is one posting each; at
 * 100,000 prints "202" takes about 31 ms, against 17 ms for a word every print holds).
 */
const MAX_PREFIX_WORDS = 50;
const PREFIX_FACTOR = 0.6;
const FUZZY_FACTOR = [1, 0.45, 0.3];

/**
 * The indexed words a typed word matches: itself; words it begins (a word of letters from
 * 2 letters on, a number from 3 characters on, so "202" and "2024.00" find accession
 * numbers but "1" does not expand to every number); and, only when the word itself is not
 * in the index (a likely typo), words within one edit (two from 8 letters on). Numbers
 * never match fuzzily: 12 minutes is not 13.
 */
export function expandWord(vocabulary: Vocabulary, typed: string): Expansion[] {
  const found = new Map<number, number>();
  const exact = vocabulary.idOf(typed);
  if (exact !== undefined) found.set(exact, 1);
  const hasDigit = /\d/.test(typed);
  if (typed.length >= (hasDigit ? 3 : 2)) {
    const prefixed = vocabulary.withPrefix(typed);
    const cap = hasDigit ? Infinity : MAX_PREFIX_WORDS;
    for (let i = 0, added = 0; i < prefixed.length && added < cap; i += 1) {
      if (found.has(prefixed[i]!)) continue;
      found.set(prefixed[i]!, PREFIX_FACTOR);
      added += 1;
    }
  }
  if (exact === undefined && !hasDigit && typed.length >= 4) {
    const max = typed.length >= 8 ? 2 : 1;
    for (const { id, distance } of vocabulary.near(typed, max))
      if (!found.has(id)) found.set(id, FUZZY_FACTOR[distance]!);
  }
  return [...found].map(([word, factor]) => ({ word, factor }));
}
