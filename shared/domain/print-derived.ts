import { parseApproximateDate } from './approximate-date';
import {
  hasProcessingRisk,
  processingRiskReasons,
  totalMinutes,
  type RiskReason,
} from './processing';
import type { TimedStep } from './processing';
import { toneBaselineRiskReasons, type ToneRiskReason } from './tone-processing-risk';
import type { Process } from './vocabulary';

export interface PrintDerivedFields {
  madeFrom: string | null;
  madeTo: string | null;
  fixingMinutes: number | null;
  washingMinutes: number | null;
  riskReasons: StoredRiskReason[];
  hasProcessingRisk: boolean;
}

/** Every reason kept on a print: from its processing steps and from its tone record. */
export type StoredRiskReason = RiskReason | ToneRiskReason;

/** Fields kept on a print for filtering, computed from what the archivist entered. */
export function derivePrintFields(input: {
  madeOn: string | null;
  process: Process;
  processing: readonly TimedStep[];
  /** Date of the print's current tone baseline, if it has one. */
  toneBaselineOn?: string | null;
}): PrintDerivedFields {
  const range = input.madeOn ? parseApproximateDate(input.madeOn) : null;
  const stepReasons = processingRiskReasons(input.processing, input.process);
  const toneReasons = toneBaselineRiskReasons(
    range?.from ?? null,
    range?.to ?? null,
    input.toneBaselineOn ?? null,
  );
  const riskReasons: StoredRiskReason[] = [...stepReasons, ...toneReasons];
  return {
    madeFrom: range?.from ?? null,
    madeTo: range?.to ?? null,
    fixingMinutes: totalMinutes(input.processing, 'fixing'),
    washingMinutes: totalMinutes(input.processing, 'washing'),
    riskReasons,
    hasProcessingRisk: hasProcessingRisk(stepReasons) || toneReasons.length > 0,
  };
}
