import type { SolubilityWarning } from '../domain/chemistry/solubility';
import type { ExposureSuggestion } from '../domain/printing-log';
import type { Stage, ToneStatus } from '../domain/vocabulary';
import type { NegativeView, SolutionBatchView } from './catalogue';

/** `GET /api/chemistry/solution`. */
export interface SolutionAnswer {
  chemical: string;
  formula: string;
  grams: number;
  molarMass: number;
  molarity: number;
  /** Where the molar mass comes from. */
  atomicWeights: string;
  cautions: string[];
  /** Problems with the recipe itself, such as more solute than water dissolves. */
  warnings: SolubilityWarning[];
}

/** A print made with a batch, as the batch's page lists it. */
export interface BatchPrintView {
  id: number;
  accessionNumber: string;
  title: string;
  madeOn: string | null;
  stages: Stage[];
  toneStatus: ToneStatus;
  processingRisk: boolean;
}

/** `GET /api/solution-batches/:id`. */
export interface SolutionBatchDetail extends SolutionBatchView {
  prints: BatchPrintView[];
  /** For a bath used in fixing: sheets through it so far and what it should fix. */
  fixerUse: { sheets: number; capacitySheets: number | null; sheetsPerLitre: number } | null;
}

/** One print in a negative's printing log. */
export interface PrintingLogEntry {
  id: number;
  accessionNumber: string;
  title: string;
  madeOn: string | null;
  paper: { id: number; name: string } | null;
  lightSource: string | null;
  exposureMinutes: number | null;
  toneStatus: ToneStatus;
}

/** `GET /api/negatives/:id/printing-log`. */
export interface PrintingLogView {
  negative: NegativeView;
  prints: PrintingLogEntry[];
  /** A starting exposure for each paper and light source already used with the negative. */
  suggestions: Array<{
    paper: { id: number; name: string } | null;
    lightSource: string;
    suggestion: ExposureSuggestion;
  }>;
}
