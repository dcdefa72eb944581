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
}

/** Everything the print keeps about its tone, from its checks and the settings. */
export function evaluatePrintChecks(
  checks: readonly CheckWithReadings[],
  settings: ToneSettings,
): PrintToneState {
  const current = currentSeries(checks);
  const trend = toneTrend(checks, settings.tone.noticeableDE00);
  const { status, flags, urgency } = evaluateTone(trend, settings.tone);
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
  };
}
