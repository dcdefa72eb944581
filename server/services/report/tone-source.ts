/**
 * The seam between the report and the tone-watch area. The PDF asks this one function
 * for a print's tone comparison and trend; until the tone-checks tables are merged it
 * answers null and the report says no checks are recorded.
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
  void printId;
  return null;
}
