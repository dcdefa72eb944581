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

/** BM25's length normalisation of a field of `length` words. */
export function fieldNorm(field: TextField, length: number): number {
  return K1 * (1 - B + (B * length) / FIELDS[field].usualLength);
}

/**
 * BM25's saturating weight of a word found `tf` times in a field (`norm` from
 * `fieldNorm`): the part of the score that depends on the document alone.
 */
export function wordWeight(field: TextField, tf: number, norm: number): number {
  return (FIELDS[field].boost * tf * (K1 + 1)) / (tf + norm);
}

/** BM25's inverse document frequency, never negative. */
export function inverseFrequency(documents: number, frequency: number): number {
  return Math.log(1 + (documents - frequency + 0.5) / (frequency + 0.5));
}
