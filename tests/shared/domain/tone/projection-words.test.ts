import { describe, expect, it } from 'vitest';
import { ratePerYear, signedFixed } from '../../../../shared/domain/tone/numbers';
import { projectionWords } from '../../../../shared/domain/tone/projection-words';

const base = {
  latestDE00: 1.2,
  projectedOn: '2027-06-01',
  hasTrend: true,
  noticeableDE00: 2,
  horizonYears: 5,
  today: '2026-12-02',
};

describe('projection words', () => {
  it('says "already noticeable" for a patch whose ΔE00 has reached the threshold, not a past date', () => {
    expect(projectionWords({ ...base, latestDE00: 2.4, projectedOn: '2026-03-22' })).toBe(
      'already noticeable',
    );
  });

  it('says "not within N years" past the projectionYears horizon instead of a far date', () => {
    expect(projectionWords({ ...base, projectedOn: '2115-01-01' })).toBe(
      'not noticeable within 5 years',
    );
    expect(projectionWords({ ...base, projectedOn: null })).toBe('not noticeable within 5 years');
    expect(projectionWords({ ...base, horizonYears: 1, projectedOn: '2029-01-01' })).toBe(
      'not noticeable within 1 year',
    );
  });

  it('gives the date within the horizon, and nothing without a trend', () => {
    expect(projectionWords(base)).toBe('noticeable by 2027-06-01');
    expect(projectionWords({ ...base, hasTrend: false, projectedOn: null })).toBeNull();
  });
});

describe('rates and signed numbers', () => {
  it('a rate that rounds to zero reads as zero, without a sign', () => {
    expect(ratePerYear(-0.001)).toBe('0.00 a year');
    expect(ratePerYear(0.004)).toBe('0.00 a year');
    expect(ratePerYear(-0.05)).toBe('−0.05 a year');
    expect(ratePerYear(0.126)).toBe('+0.13 a year');
    expect(signedFixed(-0.0004, 3)).toBe('0.000');
  });
});
