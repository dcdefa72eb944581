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
});

describe('boundedEditDistance', () => {
  it('gives the textbook kitten/sitting distance of 3 (Levenshtein 1966; the usual worked example)', () => {
    expect(boundedEditDistance('kitten', 'sitting', 5)).toBe(3);
    expect(boundedEditDistance('kitten', 'sitting', 2)).toBe(3);
  });

  it('agrees with fast-levenshtein within the bound, and says "more" beyond it', () => {
    fc.assert(
      fc.property(
        fc.string({ unit: fc.constantFrom('a', 'b', 'c', 'd'), maxLength: 9 }),
        fc.string({ unit: fc.constantFrom('a', 'b', 'c', 'd'), maxLength: 9 }),
        fc.integer({ min: 0, max: 3 }),
        (a, b, max) => {
          const reference = levenshtein.get(a, b);
          expect(boundedEditDistance(a, b, max)).toBe(reference <= max ? reference : max + 1);
        },
      ),
      { numRuns: 500 },
    );
  });
});
