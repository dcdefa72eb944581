import { describe, expect, it } from 'vitest';
import { Vocabulary } from '../../../../server/services/search/vocabulary';
import {
  OPEN,
  PLACE,
  RESTRICTED,
  WordWeigher,
} from '../../../../server/services/search/word-weigher';
import type { TextField } from '../../../../server/services/search/weights';

/** Weights by kind and word, as the weigher emits them. */
function weigh(weigher: WordWeigher, text: Partial<Record<TextField, string>>) {
  const out: Array<Map<string, number>> = [new Map(), new Map(), new Map()];
  weigher.weigh(text, (kind, word, weight) => {
    expect(out[kind]!.has(weigher.vocabulary.words[word]!)).toBe(false);
    out[kind]!.set(weigher.vocabulary.words[word]!, weight);
  });
  return out;
}

/**
 * BM25's document-side term weight, written out from Robertson & Zaragoza (2009), "The
 * Probabilistic Relevance Framework: BM25 and Beyond", eq. 3.15, with field boosts summed
 * as in BM25F (sec. 3.5): boost · tf · (k1 + 1) / (tf + k1 · (1 − b + b · len / avglen)),
 * k1 = 1.2, b = 0.5; title boost 3 and usual length 5, description 1 and 30 (weights.ts).
 */
const bm25 = (boost: number, tf: number, length: number, usual: number) =>
  (boost * tf * 2.2) / (tf + 1.2 * (0.5 + (0.5 * length) / usual));

describe('WordWeigher', () => {
  it('gives each word its BM25 weight, summed over the fields it appears in', () => {
    const weigher = new WordWeigher(new Vocabulary());
    const [open] = weigh(weigher, {
      title: 'Salt print of the weir, weir at dusk',
      description: 'Weir in flood',
    });
    // Title: 8 words, "weir" twice; description: 3 words, "weir" once.
    expect(open!.get('weir')).toBeCloseTo(bm25(3, 2, 8, 5) + bm25(1, 1, 3, 30), 12);
    expect(open!.get('salt')).toBeCloseTo(bm25(3, 1, 8, 5), 12);
    expect(open!.get('flood')).toBeCloseTo(bm25(1, 1, 3, 30), 12);
  });

  it('treats spellings of one word as one word, and keeps place and private marks apart', () => {
    const weigher = new WordWeigher(new Vocabulary());
    const [open, place, restricted] = weigh(weigher, {
      title: 'Fibre FIBER fiber',
      place: 'Cabinet Fibre',
      privateMarks: 'pencil fibre',
    });
    expect([...open!.keys()]).toEqual(['fiber']);
    expect(open!.get('fiber')).toBeCloseTo(bm25(3, 3, 3, 5), 12);
    expect([...place!.keys()]).toEqual(['cabinet', 'fiber']);
    expect([...restricted!.keys()]).toEqual(['pencil', 'fiber']);
    expect(OPEN).not.toBe(PLACE);
    expect(PLACE).not.toBe(RESTRICTED);
  });

  it('starts every document from nothing, however many words came before', () => {
    const weigher = new WordWeigher(new Vocabulary());
    // More distinct words than the weigher's first arrays hold, so they must grow.
    const many = Array.from({ length: 3000 }, (_, i) => `w${i}x`).join(' ');
    weigh(weigher, { description: many });
    const [open] = weigh(weigher, { title: 'w5x w2999x' });
    expect([...open!.keys()]).toEqual(['w5x', 'w2999x']);
    expect(open!.get('w2999x')).toBeCloseTo(bm25(3, 1, 2, 5), 12);
    expect(weigher.vocabulary.size).toBe(3000);
  });
});
