import { parseApproximateDate } from './approximate-date';
import {
  hasProcessingRisk,
  processingRiskReasons,
  totalMinutes,
  type RiskReason,
} from './processing';
import type { TimedStep } from './processing';
import type { Process } from './vocabulary';

export interface PrintDerivedFields {
  madeFrom: string | null;
  madeTo: string | null;
  fixingMinutes: number | null;
  washingMinutes: number | null;
  riskReasons: RiskReason[];
  hasProcessingRisk: boolean;
}

/** Fields kept on a print for filtering, computed from what the archivist entered. */
export function derivePrintFields(input: {
  madeOn: string | null;
  process: Process;
  processing: readonly TimedStep[];
}): PrintDerivedFields {
  const range = input.madeOn ? parseApproximateDate(input.madeOn) : null;
  const riskReasons = processingRiskReasons(input.processing, input.process);
  return {
    madeFrom: range?.from ?? null,
    madeTo: range?.to ?? null,
    fixingMinutes: totalMinutes(input.processing, 'fixing'),
    washingMinutes: totalMinutes(input.processing, 'washing'),
    riskReasons,
    hasProcessingRisk: hasProcessingRisk(riskReasons),
  };
}
