import { describe, expect, it } from 'vitest';
import { meanWithInterval, t95, washingBand } from '../../../../shared/domain/tone/cohort-stats';

describe('mean with a 95 % interval', () => {
  it('1..5: mean 3, s = √2.5, t(4) = 2.776 → 3 ± 1.963 (worked by hand)', () => {
    // t quantiles: NIST/SEMATECH e-Handbook of Statistical Methods, table 1.3.6.7.2.
    expect(t95(4)).toBe(2.776);
    const result = meanWithInterval([1, 2, 3, 4, 5]);
    expect(result.mean).toBe(3);
    expect(result.low).toBeCloseTo(1.0371, 3);
    expect(result.high).toBeCloseTo(4.9629, 3);
  });

  it('one value has a mean but no interval; none has neither', () => {
    expect(meanWithInterval([2])).toEqual({ n: 1, mean: 2, low: null, high: null });
    expect(meanWithInterval([]).mean).toBeNull();
  });
});

describe('bands', () => {
  it('washing bands meet at the 5- and 10-minute rules (common practice)', () => {
    expect(washingBand(4.9).key).toBe('lt5');
    expect(washingBand(5).key).toBe('5-10');
    expect(washingBand(10).key).toBe('10-30');
    expect(washingBand(null).key).toBe('none');
  });
});
