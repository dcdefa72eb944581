import type { RiskSeverity } from './processing';

/** A processing-risk reason that comes from the tone record rather than the steps. */
export interface ToneRiskReason {
  code: 'early-baseline';
  severity: RiskSeverity;
  message: string;
  /** What the rule rests on, as for the rules of the steps. */
  basis?: string;
}

/**
 * Rule of thumb (common practice of salt printers): a print's tones keep shifting for days
 * as it dries down, so a baseline measured on the day it was made is not a fair reference.
 * Only an exact making date can be compared; "c. 1998" or a year says nothing about the day.
 */
export function measuredBeforeDryDown(
  madeFrom: string | null,
  madeTo: string | null,
  baselineOn: string | null,
): boolean {
  return Boolean(baselineOn && madeFrom && madeFrom === madeTo && baselineOn <= madeFrom);
}

/** The reason, when the print's tone baseline was measured on the day it was made. */
export function toneBaselineRiskReasons(
  madeFrom: string | null,
  madeTo: string | null,
  baselineOn: string | null,
): ToneRiskReason[] {
  if (!measuredBeforeDryDown(madeFrom, madeTo, baselineOn)) return [];
  return [
    {
      code: 'early-baseline',
      severity: 'risk',
      message: `Tone baseline measured on ${baselineOn}, the day the print was made: tones keep shifting as a print dries down (common practice).`,
      basis:
        'Common practice of salt printers: tones keep shifting for days as a print dries down.',
    },
  ];
}
