import type { ToneStatus } from '../vocabulary';
import { currentSeries } from './baseline';
import type { ToneSettings } from './settings';
import { evaluateTone, nextCheckDue, type ToneFlag } from './status';
import { toneTrend, type CheckWithReadings, type PatchTrend } from './trend';

export interface PrintToneState {
  status: ToneStatus;
  flags: ToneFlag[];
  urgency: number;
  nextCheckDue: string | null;
  baselineOn: string | null;
  /** The fastest patch's ΔE00 slope per year, for cohorts; null without a fitted trend. */
  ratePerYear: number | null;
  trend: PatchTrend[];
  /** ΔE00 at each check of the patch that has changed most, for a small line in lists. */
  sparkline: number[];
}

/** The series of the patch whose last ΔE00 is largest, rounded to 0.01 for storage. */
export function sparklineOf(trend: readonly PatchTrend[]): number[] {
  let best: PatchTrend | undefined;
  for (const patch of trend) {
    const last = patch.series[patch.series.length - 1]?.dE00 ?? 0;
    const bestLast = best?.series[best.series.length - 1]?.dE00 ?? -1;
    if (last > bestLast) best = patch;
  }
  return best ? best.series.map((point) => Number(point.dE00.toFixed(2))) : [];
}

/** Everything the print keeps about its tone, from its checks and the settings. */
export function evaluatePrintChecks(
  checks: readonly CheckWithReadings[],
  settings: ToneSettings,
  /** The print's stored status, so a change within the repeatability keeps it. */
  previous?: ToneStatus,
): PrintToneState {
  const current = currentSeries(checks);
  const trend = toneTrend(checks, settings.tone.noticeableDE00);
  const { status, flags, urgency } = evaluateTone(trend, settings.tone, previous);
  const last = current?.series[current.series.length - 1] ?? null;
  const slopes = trend.flatMap((patch) => (patch.slopePerYear ? [patch.slopePerYear.dE00] : []));
  return {
    status,
    flags,
    urgency,
    nextCheckDue: nextCheckDue(last?.checkedOn ?? null, status, settings.schedule),
    baselineOn: current?.baseline.checkedOn ?? null,
    ratePerYear: slopes.length ? Math.max(...slopes) : null,
    trend,
    sparkline: sparklineOf(trend),
  };
}
