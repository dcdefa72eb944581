import { describe, expect, it } from 'vitest';
import { currentSeries } from '../../../../shared/domain/tone/baseline';
import { addMonths } from '../../../../shared/domain/tone/dates';
import { leastSquares, toneTrend } from '../../../../shared/domain/tone/trend';

const check = (id: number, checkedOn: string, L: number, b = 0, baseline = false) => ({
  id,
  checkedOn,
  baseline,
  readings: [{ patch: 'mid', L, a: 0, b }],
});

describe('least squares (worked by hand)', () => {
  it('x 0..3, y 1,3,2,5: slope 1.1, intercept 1.1', () => {
    // x̄ 1.5, ȳ 2.75, Sxy 5.5, Sxx 5.
    const fit = leastSquares([0, 1, 2, 3], [1, 3, 2, 5])!;
    expect(fit.slope).toBeCloseTo(1.1, 12);
    expect(fit.intercept).toBeCloseTo(1.1, 12);
  });

  it('needs spread in x', () => {
    expect(leastSquares([2, 2], [1, 3])).toBeNull();
  });
});

describe('baseline and series', () => {
  it('the flagged baseline starts the series; without a flag the earliest check does', () => {
    const checks = [
      check(3, '2022-01-01', 50),
      check(1, '2020-01-01', 50),
      check(2, '2021-01-01', 50, 0, true),
    ];
    expect(currentSeries(checks)!.baseline.id).toBe(2);
    expect(currentSeries(checks)!.series.map((c) => c.id)).toEqual([2, 3]);
    const unflagged = checks.map((c) => ({ ...c, baseline: false }));
    expect(currentSeries(unflagged)!.baseline.id).toBe(1);
  });

  it('a newer baseline starts a new series', () => {
    const checks = [check(1, '2020-01-01', 50, 0, true), check(2, '2023-01-01', 50, 0, true)];
    expect(currentSeries(checks)!.series.map((c) => c.id)).toEqual([2]);
  });
});

describe('tone trend', () => {
  it('a b* rising 0.002 a day has a slope of 0.7305 a year (365.25 days); L* and density 0', () => {
    const trend = toneTrend(
      [
        check(1, '2020-01-01', 60, 4),
        check(2, '2021-01-01', 60, 4 + 0.002 * 366),
        check(3, '2022-01-01', 60, 4 + 0.002 * 731),
      ],
      2,
    );
    const slopes = trend[0]!.slopePerYear!;
    expect(slopes.b).toBeCloseTo(0.7305, 9);
    expect(slopes.L).toBeCloseTo(0, 12);
    expect(slopes.density).toBeCloseTo(0, 12);
  });

  it('projects the day ΔE00 reaches the threshold (constructed series, worked by hand)', () => {
    // Midtone L* 50 → 49 → 48 at 0, 4, 8 years; a* = b* = 0, so ΔE00 = |ΔL*| / SL with
    // SL = 1 + 0.015 (L̄ − 50)² / √(20 + (L̄ − 50)²) (Sharma et al. 2005, eq. 10):
    // ΔE00 = 0, 0.999167, 1.993475. Least squares: slope 0.249184 a year, intercept 0.000810;
    // 2.0 is reached after 8.02295 years = 2930.4 days: 2028-01-09.
    const trend = toneTrend(
      [check(1, '2020-01-01', 50), check(2, '2024-01-01', 49), check(3, '2028-01-01', 48)],
      2,
    );
    expect(trend[0]!.series.map((p) => p.dE00.toFixed(6))).toEqual([
      '0.000000',
      '0.999167',
      '1.993475',
    ]);
    expect(trend[0]!.slopePerYear!.dE00).toBeCloseTo(0.249184, 5);
    expect(trend[0]!.projectedNoticeableOn).toBe('2028-01-09');
  });

  it('gives no date to a projection centuries away (a nearly flat rise)', () => {
    const flat = toneTrend(
      [
        check(1, '2020-01-01', 50),
        check(2, '2021-01-01', 50.0001),
        check(3, '2022-01-01', 50.0002),
      ],
      2,
    );
    expect(flat[0]!.slopePerYear!.dE00).toBeGreaterThan(0);
    expect(flat[0]!.projectedNoticeableOn).toBeNull();
  });

  it('fits no slope to fewer than 3 checks and projects nothing for a falling ΔE00', () => {
    expect(
      toneTrend([check(1, '2020-01-01', 50), check(2, '2021-01-01', 48)], 2)[0]!.slopePerYear,
    ).toBeNull();
    const recovering = toneTrend(
      [
        check(1, '2020-01-01', 50),
        check(2, '2021-01-01', 48),
        check(3, '2022-01-01', 49.5),
        check(4, '2023-01-01', 50),
      ],
      2,
    );
    expect(recovering[0]!.projectedNoticeableOn).toBeNull();
  });
});

describe('calendar months', () => {
  it('keeps the day, or the last day of a shorter month', () => {
    expect(addMonths('2024-03-02', 24)).toBe('2026-03-02');
    expect(addMonths('2024-01-31', 1)).toBe('2024-02-29');
    expect(addMonths('2024-08-15', 6)).toBe('2025-02-15');
  });
});
