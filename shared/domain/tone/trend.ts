import { currentSeries, type DatedCheck } from './baseline';
import { deltaE00 } from './colour-difference';
import type { Reading } from './comparison';
import { addDays, daysBetween, YEAR_DAYS } from './dates';
import { densityFromLightness } from './density';

export interface CheckWithReadings extends DatedCheck {
  readings: readonly Reading[];
}

export interface SeriesPoint {
  checkedOn: string;
  L: number;
  a: number;
  b: number;
  density: number;
  dE00: number;
}

export interface PatchTrend {
  patch: string;
  series: SeriesPoint[];
  /** Least-squares slopes per year (365.25 days); null with fewer than 3 checks. */
  slopePerYear: { dE00: number; L: number; b: number; density: number } | null;
  /** When the fitted ΔE00 line reaches the noticeable threshold; null if it never rises. */
  projectedNoticeableOn: string | null;
}

/** The fewest checks a slope is fitted to. */
export const MIN_TREND_CHECKS = 3;
/** Projections further than this from the baseline are not given a date. */
export const MAX_PROJECTION_YEARS = 100;

/** Ordinary least squares of y on x: slope and intercept; null without spread in x. */
export function leastSquares(
  xs: readonly number[],
  ys: readonly number[],
): { slope: number; intercept: number } | null {
  const n = xs.length;
  if (n < 2) return null;
  const meanX = xs.reduce((s, x) => s + x, 0) / n;
  const meanY = ys.reduce((s, y) => s + y, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i += 1) {
    sxx += (xs[i]! - meanX) ** 2;
    sxy += (xs[i]! - meanX) * (ys[i]! - meanY);
  }
  if (sxx === 0) return null;
  const slope = sxy / sxx;
  return { slope, intercept: meanY - slope * meanX };
}

/** Per patch of the baseline: the series since the baseline, the slopes and the projection. */
export function toneTrend(
  checks: readonly CheckWithReadings[],
  noticeableDE00: number,
): PatchTrend[] {
  const current = currentSeries(checks);
  if (!current) return [];
  const { baseline, series } = current;
  // Re-evaluating 100,000 prints runs this 100,000 times: no intermediate objects per point.
  const yearsOf = series.map(
    (check) => daysBetween(baseline.checkedOn, check.checkedOn) / YEAR_DAYS,
  );
  return baseline.readings.map((reference) => {
    const points: SeriesPoint[] = [];
    const xs: number[] = [];
    series.forEach((check, index) => {
      const reading = check.readings.find((r) => r.patch === reference.patch);
      if (!reading) return;
      xs.push(yearsOf[index]!);
      points.push({
        checkedOn: check.checkedOn,
        L: reading.L,
        a: reading.a,
        b: reading.b,
        density: densityFromLightness(reading.L),
        dE00: deltaE00(reference, reading),
      });
    });
    return {
      patch: reference.patch,
      series: points,
      ...fit(points, xs, baseline.checkedOn, noticeableDE00),
    };
  });
}

/** `leastSquares` of one column of the points, without copying it into an array. */
function fitColumn(
  xs: readonly number[],
  meanX: number,
  points: readonly SeriesPoint[],
  key: 'dE00' | 'L' | 'b' | 'density',
): { slope: number; intercept: number } | null {
  const n = xs.length;
  let sumY = 0;
  for (const point of points) sumY += point[key];
  const meanY = sumY / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i += 1) {
    sxx += (xs[i]! - meanX) ** 2;
    sxy += (xs[i]! - meanX) * (points[i]![key] - meanY);
  }
  if (sxx === 0) return null;
  const slope = sxy / sxx;
  return { slope, intercept: meanY - slope * meanX };
}

function fit(
  points: readonly SeriesPoint[],
  xs: readonly number[],
  baselineOn: string,
  noticeableDE00: number,
): Pick<PatchTrend, 'slopePerYear' | 'projectedNoticeableOn'> {
  if (points.length < MIN_TREND_CHECKS) return { slopePerYear: null, projectedNoticeableOn: null };
  const meanX = xs.reduce((s, x) => s + x, 0) / xs.length;
  const dE00 = fitColumn(xs, meanX, points, 'dE00');
  const L = fitColumn(xs, meanX, points, 'L');
  const b = fitColumn(xs, meanX, points, 'b');
  const density = fitColumn(xs, meanX, points, 'density');
  if (!dE00 || !L || !b || !density) return { slopePerYear: null, projectedNoticeableOn: null };
  // A nearly flat rise projects centuries ahead: beyond any horizon worth a date.
  const yearsToNoticeable = dE00.slope > 0 ? (noticeableDE00 - dE00.intercept) / dE00.slope : null;
  const projectedNoticeableOn =
    yearsToNoticeable !== null && yearsToNoticeable <= MAX_PROJECTION_YEARS
      ? addDays(baselineOn, yearsToNoticeable * YEAR_DAYS)
      : null;
  return {
    slopePerYear: { dE00: dE00.slope, L: L.slope, b: b.slope, density: density.slope },
    projectedNoticeableOn,
  };
}
