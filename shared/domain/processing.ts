import type { Process, Stage } from './vocabulary';

/** The least a step needs for the computations below. */
export interface TimedStep {
  stage: Stage;
  minutes?: number | null;
  solutionBatchId?: number | null;
}

/** Total minutes spent in one stage; a print may have more than one fixing bath. */
export function totalMinutes(steps: readonly TimedStep[], stage: Stage): number | null {
  const inStage = steps.filter((step) => step.stage === stage);
  if (inStage.length === 0) return null;
  return inStage.reduce((sum, step) => sum + (step.minutes ?? 0), 0);
}

export type RiskSeverity = 'risk' | 'advice';

export type RiskCode =
  | 'no-fixing'
  | 'short-fixing'
  | 'no-washing'
  | 'short-washing'
  | 'brief-washing'
  | 'no-prewash'
  | 'prewash-before-exposure'
  | 'exhausted-fixer'
  | 'possibly-exhausted-fixer'
  | 'fixer-over-capacity'
  | 'fixer-mixed-after-print';

export interface RiskReason {
  code: RiskCode;
  severity: RiskSeverity;
  message: string;
  /** What the rule rests on (reasons stored before this field existed lack it). */
  basis?: string;
}

/** A fixer bath as used for one print, for the rules that need more than the steps. */
export interface FixerBatchUse {
  id: number;
  code: string;
  /** When the batch record says it was mixed (a print cannot be fixed in it before). */
  madeOn?: string | null;
  exhaustedOn: string | null;
  /** Sheets (8×10 in equivalents) through the bath up to and including this print. */
  sheetsThrough: number | null;
  /** Sheets the bath should fix in all (volume × the capacity setting), when known. */
  capacitySheets: number | null;
}

/**
 * Facts beyond the steps that some rules need; every field optional, so callers that know
 * nothing more (a print being typed in) get the step rules alone.
 */
export interface RiskContext {
  /** The earliest day the print can have been made (an approximate date's start). */
  madeFrom?: string | null;
  /** The latest day it can have been made (an approximate date's end; else `madeFrom`). */
  madeTo?: string | null;
  /** The fixer batches its fixing steps name. */
  fixerBatches?: readonly FixerBatchUse[];
}

/**
 * Rules of thumb for printing-out processes (common practice among salt printers):
 * fix at least 10 minutes in thiosulfate, wash at least 5 (10 or more preferred), and
 * pre-wash before fixing so free silver nitrate does not foul the fixer.
 */
export const PROCESSING_RULES = {
  minFixingMinutes: 10,
  minWashingMinutes: 5,
  preferredWashingMinutes: 10,
} as const;

/** Silver images are fixed in thiosulfate; iron and platinum processes are not. */
const FIXED_PROCESSES: ReadonlySet<Process> = new Set([
  'salt print',
  'albumen print',
  'hand-coated silver gelatin',
]);
/** Printing-out papers carry free silver nitrate that a pre-wash removes. */
const PREWASHED_PROCESSES: ReadonlySet<Process> = new Set(['salt print', 'albumen print']);

const COMMON_PRACTICE = 'Common practice of salt and albumen printers; a rule of thumb.';
const BASIS: Record<RiskCode, string> = {
  'no-fixing': COMMON_PRACTICE,
  'short-fixing': COMMON_PRACTICE,
  'no-washing': COMMON_PRACTICE,
  'short-washing': COMMON_PRACTICE,
  'brief-washing': COMMON_PRACTICE,
  'no-prewash': COMMON_PRACTICE,
  'prewash-before-exposure':
    'Common practice: the sensitiser is water-soluble silver nitrate, so water before exposure takes it off the paper.',
  'exhausted-fixer':
    'Common practice: an exhausted fixer no longer dissolves the silver salts; the date is the batch record’s.',
  'possibly-exhausted-fixer':
    'Common practice: an exhausted fixer no longer dissolves the silver salts; the print’s approximate date spans the batch record’s exhausted date.',
  'fixer-over-capacity':
    'Common practice: a bath fixes a limited area of paper; the capacity is a setting (Chemistry).',
  'fixer-mixed-after-print':
    'A check of the records: a print cannot have been fixed in a bath mixed after it was made, so the print’s date or its batch is likely mistyped.',
};

/**
 * Why a print's processing history may shorten its life; empty when it follows the rules.
 * `context` adds the rules that need more than the steps (batch records, dates).
 */
export function processingRiskReasons(
  steps: readonly TimedStep[],
  process: Process,
  context: RiskContext = {},
): RiskReason[] {
  if (steps.length === 0) return [];
  const fixed = FIXED_PROCESSES.has(process);
  return [
    ...(fixed ? fixingReasons(totalMinutes(steps, 'fixing')) : []),
    ...washingReasons(totalMinutes(steps, 'washing')),
    ...(PREWASHED_PROCESSES.has(process) ? prewashReasons(steps) : []),
    ...(fixed ? fixerBatchReasons(context) : []),
  ];
}

function fixerBatchReasons({ madeFrom, madeTo, fixerBatches = [] }: RiskContext): RiskReason[] {
  const reasons: RiskReason[] = [];
  const latest = madeTo ?? madeFrom;
  for (const batch of fixerBatches) {
    if (batch.exhaustedOn && madeFrom && batch.exhaustedOn < madeFrom) {
      reasons.push(
        risk(
          'exhausted-fixer',
          `Fixer batch ${batch.code} was marked exhausted on ${batch.exhaustedOn}, before the print was made.`,
        ),
      );
    } else if (batch.exhaustedOn && madeFrom && latest && batch.exhaustedOn < latest) {
      // An approximate date (c. 2025) that reaches past the exhausted date: it may have been.
      reasons.push(
        risk(
          'possibly-exhausted-fixer',
          `Fixer batch ${batch.code} was marked exhausted on ${batch.exhaustedOn}; the print’s date (${madeFrom} to ${latest}) reaches past it, so it may have been fixed in the spent bath.`,
        ),
      );
    }
    if (batch.madeOn && latest && latest < batch.madeOn) {
      // Not a risk to the print: one of the two records is wrong, and a person should look.
      reasons.push({
        code: 'fixer-mixed-after-print',
        severity: 'advice',
        message: `Fixer batch ${batch.code} was mixed on ${batch.madeOn}, after the print was made (${madeFrom === latest ? latest : `${madeFrom} to ${latest}`}): check the print’s date or its batch.`,
        basis: BASIS['fixer-mixed-after-print'],
      });
    }
    const { sheetsThrough, capacitySheets } = batch;
    if (sheetsThrough != null && capacitySheets != null && sheetsThrough > capacitySheets) {
      reasons.push(
        risk(
          'fixer-over-capacity',
          `Fixer batch ${batch.code} had fixed about ${round1(sheetsThrough)} sheets (8×10 in equivalents) by this print; its capacity is ${round1(capacitySheets)}.`,
        ),
      );
    }
  }
  return reasons;
}

const round1 = (value: number) => Math.round(value * 10) / 10;

function fixingReasons(fixing: number | null): RiskReason[] {
  const { minFixingMinutes } = PROCESSING_RULES;
  if (fixing === null) {
    return [risk('no-fixing', 'No fixing step recorded: unfixed silver salts darken in light.')];
  }
  if (fixing < minFixingMinutes) {
    return [risk('short-fixing', `Fixed ${fixing} min; ${minFixingMinutes} min or more is usual.`)];
  }
  return [];
}

function washingReasons(washing: number | null): RiskReason[] {
  const { minWashingMinutes, preferredWashingMinutes } = PROCESSING_RULES;
  if (washing === null) {
    return [risk('no-washing', 'No washing step recorded: residual fixer yellows and fades.')];
  }
  if (washing < minWashingMinutes) {
    return [
      risk('short-washing', `Washed ${washing} min; at least ${minWashingMinutes} min is usual.`),
    ];
  }
  if (washing < preferredWashingMinutes) {
    const message = `Washed ${washing} min; ${preferredWashingMinutes} min or more is preferred.`;
    return [{ code: 'brief-washing', severity: 'advice', message, basis: BASIS['brief-washing'] }];
  }
  return [];
}

/**
 * A pre-wash belongs between exposure and fixing. Before exposure it would wash the
 * sensitiser out; missing, free silver nitrate reaches the fixer. "Missing" is only said of
 * a history that records the exposure: one that starts at the fixer (an import of fixing and
 * washing times) does not say whether the print was pre-washed.
 */
function prewashReasons(steps: readonly TimedStep[]): RiskReason[] {
  const stages = steps.map((step) => step.stage);
  const exposureAt = stages.indexOf('exposure');
  const fixingAt = stages.indexOf('fixing');
  const reasons: RiskReason[] = [];
  const beforeExposure = exposureAt >= 0 && stages.slice(0, exposureAt).includes('prewash');
  if (beforeExposure) {
    reasons.push(
      risk(
        'prewash-before-exposure',
        'Pre-wash recorded before exposure: it would wash the sensitiser out before printing.',
      ),
    );
  }
  if (fixingAt < 0 || exposureAt < 0) return reasons;
  const prewashed = stages.some(
    (stage, index) => stage === 'prewash' && index > exposureAt && index < fixingAt,
  );
  if (!prewashed) {
    reasons.push(
      risk('no-prewash', 'No pre-wash before fixing: free silver nitrate reaches the fixer.'),
    );
  }
  return reasons;
}

/** True when any reason breaks a rule (advice alone does not count). */
export function hasProcessingRisk(reasons: readonly RiskReason[]): boolean {
  return reasons.some((reason) => reason.severity === 'risk');
}

function risk(code: RiskCode, message: string): RiskReason {
  return { code, severity: 'risk', message, basis: BASIS[code] };
}
