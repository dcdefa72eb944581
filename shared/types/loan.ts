import type { LimitExcess } from '../domain/light/dose';
import type { LoanKind, LoanStage } from '../domain/loans';
import type { Process } from '../domain/vocabulary';

/** A print on a loan, with its condition reports and what the loan would do to its light. */
export interface LoanPrintView {
  id: number;
  accessionNumber: string;
  title: string;
  process: Process;
  sheetWidthMm: number | null;
  sheetHeightMm: number | null;
  departureReportId: number | null;
  returnReportId: number | null;
  light: {
    annualLimit: number;
    plannedLuxHours: number;
    /** The years the loan would take the print past its limit, and by how much. */
    excess: LimitExcess[];
  };
}

/** `GET /api/loans/:id` (viewers get no contact and no place). */
export interface LoanView {
  id: number;
  title: string;
  kind: LoanKind;
  venue: string;
  contact?: string | null;
  startsOn: string;
  endsOn: string;
  hoursPerDay: number;
  maxLux: number;
  maxUv: number | null;
  temperatureC: { min: number; max: number } | null;
  humidityPercent: { min: number; max: number } | null;
  stage: LoanStage;
  conditionsSigned: { by: { id: number; name: string } | null; on: string } | null;
  awayPlace?: { id: number; code: string } | null;
  prints: LoanPrintView[];
  /** How many of its prints the loan would take past their annual limit. */
  printsOverLimit: number;
}

/** `GET /api/loans`. */
export interface LoanSummary {
  id: number;
  title: string;
  kind: LoanKind;
  venue: string;
  startsOn: string;
  endsOn: string;
  stage: LoanStage;
  prints: number;
}

/** `GET /api/prints/:id/light`. */
export interface PrintLight {
  lifetimeLuxHours: number;
  years: Array<{ year: number; luxHours: number; limit: number }>;
}
