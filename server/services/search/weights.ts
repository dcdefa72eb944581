import { searchWords } from '../../../shared/domain/search-words';

/**
 * The text fields of a print's search document. `place` is kept apart (curators and above
 * match it), and so are `privateMarks` (archivists and admins).
 */
export const TEXT_FIELDS = [
  'accessionNumber',
  'title',
  'maker',
  'tags',
  'process',
  'paper',
  'negative',
  'description',
  'processing',
  'extra',
  'marks',
  'place',
  'privateMarks',
] as const;
export type TextField = (typeof TEXT_FIELDS)[number];

/**
 * How much a word in each field counts, and the field's usual length in words. A match
 * in the accession number or title says more than one in a long description (our choice,
 * tuned on the demo collection).
 */
const FIELDS: Record<TextField, { boost: number; usualLength: number }> = {
  accessionNumber: { boost: 6, usualLength: 1 },
  title: { boost: 3, usualLength: 5 },
  maker: { boost: 2, usualLength: 2 },
  tags: { boost: 2, usualLength: 3 },
  process: { boost: 1.5, usualLength: 2 },
  paper: { boost: 1.5, usualLength: 3 },
  negative: { boost: 1.5, usualLength: 2 },
  description: { boost: 1, usualLength: 30 },
  processing: { boost: 1, usualLength: 40 },
  extra: { boost: 1, usualLength: 20 },
  marks: { boost: 1, usualLength: 12 },
  place: { boost: 1, usualLength: 6 },
  privateMarks: { boost: 1, usualLength: 12 },
};

/** BM25's term-frequency saturation and length normalisation (Robertson & Zaragoza 2009). */
const K1 = 1.2;
const B = 0.5;

const counts = new Map<string, number>();

/**
 * The weight of each word of a document, summed over its fields with BM25's saturating
 * term frequency, split into the words every reader may match, the place words and the private marks' words.
 * Fills the given maps (cleared first): a build calls this 100,000 times, and reusing
 * the maps keeps the garbage collector out of the way.
 */
export function documentWeights(
  text: Partial<Record<TextField, string>>,
  open: Map<string, number> = new Map(),
  place: Map<string, number> = new Map(),
  restricted: Map<string, number> = new Map(),
): {
  open: Map<string, number>;
  place: Map<string, number>;
  restricted: Map<string, number>;
} {
  open.clear();
  place.clear();
  restricted.clear();
  for (const field of TEXT_FIELDS) {
    const value = text[field];
    if (!value) continue;
    const words = searchWords(value);
    counts.clear();
    for (const word of words) counts.set(word, (counts.get(word) ?? 0) + 1);
    const { boost, usualLength } = FIELDS[field];
    const norm = K1 * (1 - B + (B * words.length) / usualLength);
    const into = field === 'place' ? place : field === 'privateMarks' ? restricted : open;
    for (const [word, tf] of counts)
      into.set(word, (into.get(word) ?? 0) + (boost * tf * (K1 + 1)) / (tf + norm));
  }
  return { open, place, restricted };
}

/** BM25's inverse document frequency, never negative. */
export function inverseFrequency(documents: number, frequency: number): number {
  return Math.log(1 + (documents - frequency + 0.5) / (frequency + 0.5));
}
