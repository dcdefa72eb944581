import { describe, expect, it } from 'vitest';
import { CIRCA_SPREAD_YEARS, parseApproximateDate } from '../../../shared/domain/approximate-date';

describe('approximate dates of making', () => {
  it('reads an exact ISO 8601 calendar date as a one-day range', () => {
    expect(parseApproximateDate('2026-05-14')).toEqual({ from: '2026-05-14', to: '2026-05-14' });
  });

  // Gregorian rule (ISO 8601): 2024 is a leap year, 1900 is not (divisible by 100, not 400).
  it('knows the length of February in leap and common years', () => {
    expect(parseApproximateDate('2024-02')).toEqual({ from: '2024-02-01', to: '2024-02-29' });
    expect(parseApproximateDate('1900-02')).toEqual({ from: '1900-02-01', to: '1900-02-28' });
    expect(parseApproximateDate('2023-02-29')).toBeNull();
    expect(parseApproximateDate('2000-02-29')).toEqual({ from: '2000-02-29', to: '2000-02-29' });
  });

  it('reads a year, a range, a decade and a circa year', () => {
    expect(parseApproximateDate('1998')).toEqual({ from: '1998-01-01', to: '1998-12-31' });
    expect(parseApproximateDate('2017–2019')).toEqual({ from: '2017-01-01', to: '2019-12-31' });
    expect(parseApproximateDate('1990s')).toEqual({ from: '1990-01-01', to: '1999-12-31' });
    const spread = CIRCA_SPREAD_YEARS;
    expect(parseApproximateDate('c. 1998')).toEqual({
      from: `${1998 - spread}-01-01`,
      to: `${1998 + spread}-12-31`,
    });
    expect(parseApproximateDate('circa 1998')).toEqual(parseApproximateDate('c. 1998'));
  });

  it('refuses what it cannot read, and backwards ranges', () => {
    expect(parseApproximateDate('last spring')).toBeNull();
    expect(parseApproximateDate('2019-13')).toBeNull();
    expect(parseApproximateDate('2019–2017')).toBeNull();
  });
});
