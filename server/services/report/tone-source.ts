import { listToneChecks, printToneTrend } from '../tone/read-tone';

/**
 * The seam between the report and the tone-watch area: the PDF asks this one function for
 * a print's tone comparison and trend; with no checks it answers null and the report says
 * no checks are recorded.
 */
export interface ToneReportData {
  baselineOn: string;
  latestOn: string;
  status: string;
  /** ΔE00 at which a change counts as noticeable (the settings' threshold). */
  noticeableDE00: number;
  /** Latest check against the baseline, per patch. */
  comparison: Array<{
    patch: string;
    dL: number;
    da: number;
    db: number;
    dE00: number;
    density: number | null;
    dDensity: number | null;
  }>;
  /** Every check's ΔE00 against the baseline, per patch, oldest first. */
  trend: Array<{ patch: string; series: Array<{ checkedOn: string; dE00: number }> }>;
}

/** A print's tone data for the report, or null when it has no tone checks. */
export async function readToneForReport(printId: number): Promise<ToneReportData | null> {
  const checks = await listToneChecks(printId);
  if (checks.items.length === 0) return null;
  const trend = await printToneTrend(printId);
  const dates = checks.items.map((check) => check.checkedOn).sort();
  const baseline = checks.items.find((check) => check.id === checks.baselineId);
  return {
    baselineOn: baseline?.checkedOn ?? dates[0]!,
    latestOn: dates.at(-1)!,
    status: trend.status,
    noticeableDE00: trend.thresholds.noticeableDE00,
    comparison: checks.latestComparison.map(({ patch, dL, da, db, dE00, density, dDensity }) => ({
      patch,
      dL,
      da,
      db,
      dE00,
      density,
      dDensity,
    })),
    trend: trend.patches.map((patch) => ({
      patch: patch.patch,
      series: patch.series.map(({ checkedOn, dE00 }) => ({ checkedOn, dE00 })),
    })),
  };
}
