import { describe, expect, it } from 'vitest';
import {
  bandLabel,
  bandOf,
  FIXING_BAND_EDGES,
  WASHING_BAND_EDGES,
} from '../../../shared/domain/search-bands';

describe('minute bands', () => {
  // Common practice (processing.ts): fix at least 10 minutes, so 10 must fall in one band only,
  // the one that starts there, and its label must not also be another band's upper end.
  it('put an edge in the band that starts there, and say so in the labels', () => {
    expect(bandOf(10, FIXING_BAND_EDGES)).toBe(2);
    expect(bandOf(9.9, FIXING_BAND_EDGES)).toBe(1);
    expect(bandLabel(1, FIXING_BAND_EDGES)).toBe('5 to under 10 min');
    expect(bandLabel(2, FIXING_BAND_EDGES)).toBe('10 to under 15 min');
  });

  it('name the first band "under" and the last "or more"', () => {
    expect(bandLabel(0, WASHING_BAND_EDGES)).toBe('under 5 min');
    expect(bandLabel(WASHING_BAND_EDGES.length - 1, WASHING_BAND_EDGES)).toBe('60 min or more');
  });

  it('give every band a different label', () => {
    for (const edges of [FIXING_BAND_EDGES, WASHING_BAND_EDGES]) {
      const labels = edges.map((_, band) => bandLabel(band, edges));
      expect(new Set(labels).size).toBe(edges.length);
    }
  });
});
