import type { PatchComparison, Reading } from '../domain/tone/comparison';
import type { ToneFlag } from '../domain/tone/status';
import type { PatchTrend } from '../domain/tone/trend';
import type { ToneStatus } from '../domain/vocabulary';

export interface ToneCheckView {
  id: number;
  printId: number;
  checkedOn: string;
  /** Named, never by e-mail address: every role reads a check. */
  checkedBy: { id: number; name: string } | null;
  method: string;
  instrument: string | null;
  illuminant: string;
  observer: string;
  baseline: boolean;
  notes: string | null;
  readings: Reading[];
}

/** A logged check with its comparison against the print's baseline. */
export interface ToneCheckResponse extends ToneCheckView {
  comparison: PatchComparison[];
  /** The baseline the comparison used. */
  baselineId: number;
  warnings: string[];
  tone: { status: ToneStatus; flags: ToneFlag[]; nextCheckDue: string | null };
}

export interface ToneChecksResponse {
  items: ToneCheckView[];
  baselineId: number | null;
  /** The latest check of the current series against its baseline. */
  latestComparison: PatchComparison[];
}

export interface ToneTrendResponse {
  /** The ΔE00 thresholds in force, so charts can draw them. */
  thresholds: { watchDE00: number; noticeableDE00: number; projectionYears: number };
  status: ToneStatus;
  flags: ToneFlag[];
  nextCheckDue: string | null;
  patches: PatchTrend[];
}

export interface PrintRef {
  id: number;
  accessionNumber: string;
  title: string;
}

export interface ToneWatchItem {
  print: PrintRef & {
    paper: { id: number; name: string } | null;
    location: { id: number; code: string } | null;
  };
  status: ToneStatus;
  flags: ToneFlag[];
  reasons: string[];
  nextCheckDue: string | null;
  overdue: boolean;
  /** ΔE00 of the fastest-changing patch at each check since the baseline, for a sparkline. */
  sparkline: number[];
}

export interface AlertView {
  id: number;
  print: PrintRef;
  kind: string;
  reason: string;
  openedAt: string;
  acknowledgedAt: string | null;
  acknowledgedBy: { id: number; email: string } | null;
}

export interface ReevaluationProgress {
  status: 'running' | 'done' | 'failed' | 'stopped';
  done: number;
  total: number;
  startedAt: string;
  finishedAt: string | null;
}

export interface CohortGroup {
  key: string;
  label: string;
  prints: number;
  checks: number;
  /** Mean ΔE00 per year over the group's prints with a fitted trend. */
  meanRatePerYear: number | null;
  /** 95 % interval of that mean (Student t); null with fewer than 2 prints. */
  interval: { low: number; high: number } | null;
  /** Prints with a fitted trend (at least 3 checks). */
  printsWithTrend: number;
  small: boolean;
}

export interface CohortsResponse {
  by: string;
  groups: CohortGroup[];
}

export interface ImportResult {
  created: number;
  checks: Array<{
    id: number;
    printId: number;
    accessionNumber: string;
    checkedOn: string;
    patches: string[];
  }>;
  skipped: Array<{ row: number; reason: string }>;
  /** Said once per print and day, e.g. readings already stored from an earlier import. */
  warnings: string[];
  dryRun: boolean;
}

export interface CheckRoundPlace {
  location: { id: number; code: string; path: string } | null;
  prints: Array<
    PrintRef & { status: ToneStatus; nextCheckDue: string | null; lastPatches: string[] }
  >;
}

export interface CheckRoundResponse {
  from: string;
  to: string;
  total: number;
  places: CheckRoundPlace[];
}
