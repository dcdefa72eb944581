import { createRequire } from 'node:module';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boundedEditDistance } from '../../../shared/domain/edit-distance';
import { normalizeWord, searchWords } from '../../../shared/domain/search-words';

// fast-levenshtein 2.0.6 (npm registry), a general-purpose Levenshtein implementation.
const levenshtein = createRequire(import.meta.url)('fast-levenshtein') as {
  get: (a: string, b: string) => number;
};

describe('searchWords', () => {
  it('keeps accession numbers and batch codes whole and drops the percent sign', () => {
    expect(searchWords('Fixed in FIX-24B, 15% for 12 min; 2024.0012')).toEqual([
      'fixed',
      'in',
      'fix-24b',
      '15',
      'for',
      '12',
      'min',
      '2024.0012',
    ]);
  });

  it('splits words joined by a dash before letters', () => {
    expect(searchWords('sodium-thiosulfate rod-coated')).toEqual([
      'sodium',
      'thiosulfate',
      'rod',
      'coated',
    ]);
  });

  it('treats the trade spellings alike (British/American spelling: common practice)', () => {
    expect(searchWords('Sensitising colour fibre thiosulphate')).toEqual(
      searchWords('sensitizing color fiber thiosulfate'),
    );
  });

  it('reads "hypo" as thiosulfate (the darkroom name of sodium thiosulfate, from memory)', () => {
    expect(normalizeWord('Hypo')).toBe('thiosulfate');
  });

  it('drops accents', () => {
    expect(searchWords('Café Müller')).toEqual(['cafe', 'muller']);
  });

  it("keeps words that are also an object's built-in keys as the words they are", () => {
    // The spelling table is a plain object: its prototype's keys once turned
    // "constructor" into a function and "toString" likewise.
    expect(searchWords('constructor toString hasOwnProperty')).toEqual([
      'constructor',
      'tostring',
      'hasownproperty',
    ]);
  });

  it('gives the same words for the same text however often it is asked (remembered words)', () => {
    const text = 'Sensitising Café hypo FIX-24B 2024.0012';
    const first = searchWords(text);
    for (let i = 0; i < 3; i += 1) expect(searchWords(text)).toEqual(first);
    expect(first).toEqual(['sensitizing', 'cafe', 'thiosulfate', 'fix-24b', '2024.0012']);
  });
});

describe('boundedEditDistance', () => {
  it('gives the textbook kitten/sitting distance of 3 (Levenshtein 1966; the usual worked example)', () => {
    expect(boundedEditDistance('kitten', 'sitting', 5)).toBe(3);
    expect(boundedEditDistance('kitten', 'sitting', 2)).toBe(3);
  });

  it('counts a swap of neighbours as one edit, but not twice over (Wikipedia, "Damerau–Levenshtein distance": OSA("ca", "abc") = 3)', () => {
    expect(boundedEditDistance('orchrad', 'orchard', 1)).toBe(1);
    expect(boundedEditDistance('ca', 'abc', 5)).toBe(3);
  });

  it('never exceeds Levenshtein (fast-levenshtein), and equals it on strings of distinct letters apart from swaps', () => {
    fc.assert(
      fc.property(
        fc.string({ unit: fc.constantFrom('a', 'b', 'c', 'd'), maxLength: 9 }),
        fc.string({ unit: fc.constantFrom('a', 'b', 'c', 'd'), maxLength: 9 }),
        fc.integer({ min: 0, max: 3 }),
        (a, b, max) => {
          const reference = levenshtein.get(a, b);
          const distance = boundedEditDistance(a, b, max);
          const exact = boundedEditDistance(a, b, 20);
          expect(exact).toBeLessThanOrEqual(reference);
          // Each swap replaces at most two Levenshtein edits.
          expect(exact).toBeGreaterThanOrEqual(Math.ceil(reference / 2));
          expect(distance).toBe(exact <= max ? exact : max + 1);
        },
      ),
      { numRuns: 500 },
    );
  });

  it('equals Levenshtein when the words share no letters (no swap can help)', () => {
    fc.assert(
      fc.property(
        fc.string({ unit: fc.constantFrom('a', 'b', 'c'), maxLength: 8 }),
        fc.string({ unit: fc.constantFrom('x', 'y', 'z'), maxLength: 8 }),
        (a, b) => {
          expect(boundedEditDistance(a, b, 20)).toBe(levenshtein.get(a, b));
        },
      ),
    );
  });
});
