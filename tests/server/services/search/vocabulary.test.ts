import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Vocabulary } from '../../../../server/services/search/vocabulary';

/** Letters, digits and the joiners accession numbers and batch codes keep inside a word. */
const word = fc.stringMatching(/^[ab19.-]{1,6}$/);
/** Enough different accession numbers that the sorted list's unsorted tail is merged often. */
const accession = fc.nat(4999).map((n) => `${2020 + (n % 5)}.${n}`);
const accessionStart = fc.constantFrom('2', '20', '202', '2021', '2021.', '2021.1', '2023.49');

describe('Vocabulary', () => {
  // The reference is the definition itself: every interned word that starts with the prefix,
  // found by testing each one. Words with and without digits live in different structures
  // (the radix tree, a sorted list with an unsorted tail), so adds and walks are interleaved
  // across the tail's merge point.
  it('finds every word that starts with a prefix, however adds and walks interleave', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.oneof(
            fc.oneof(word, accession).map((w) => ({ add: w })),
            fc.oneof(word, accessionStart).map((w) => ({ walk: w })),
          ),
          {
            minLength: 1500,
            maxLength: 2500,
          },
        ),
        (steps) => {
          const vocabulary = new Vocabulary();
          const added: string[] = [];
          for (const step of steps) {
            if ('add' in step) {
              const id = vocabulary.intern(step.add);
              if (id === added.length) added.push(step.add);
              expect(added[id]).toBe(step.add);
              continue;
            }
            const expected = added
              .map((w, id) => ({ w, id }))
              .filter(({ w }) => w.startsWith(step.walk))
              .map(({ id }) => id);
            const found = vocabulary.withPrefix(step.walk);
            expect(new Set(found).size).toBe(found.length);
            expect([...found].sort((a, b) => a - b)).toEqual(expected);
          }
        },
      ),
      { numRuns: 30 },
    );
  });

  it('never offers a word with a digit as a near spelling', () => {
    const vocabulary = Vocabulary.fromWords(['fixer', 'fix-24b', '2024.0012', 'fixed']);
    const near = vocabulary.near('fixes', 1).map(({ id }) => vocabulary.words[id]);
    expect(near.sort()).toEqual(['fixed', 'fixer']);
    expect(vocabulary.near('2024.0013', 1)).toEqual([]);
  });
});
