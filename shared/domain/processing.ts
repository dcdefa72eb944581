import type { Process, Stage } from './vocabulary';

/** The least a step needs for the computations below. */
export interface TimedStep {
  stage: Stage;
  minutes?: number | null;
}

/** Total minutes spent in one stage; a print may have more than one fixing bath. */
export function totalMinutes(steps: readonly TimedStep[], stage: Stage): number | null {
  const inStage = steps.filter((step) => step.stage === stage);
  if (inStage.length === 0) return null;
  return inStage.reduce((sum, step) => sum + (step.minutes ?? 0), 0);
}

export type RiskSeverity = 'risk' | 'advice';

export interface RiskReason {
  code:
    'no-fixing' | 'short-fixing' | 'no-washing' | 'short-washing' | 'brief-washing' | 'no-prewash';
  severity: RiskSeverity;
  message: string;
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

/** Why a print's processing history may shorten its life; empty when it follows the rules. */
export function processingRiskReasons(steps: readonly TimedStep[], process: Process): RiskReason[] {
  if (steps.length === 0) return [];
  return [
    ...(FIXED_PROCESSES.has(process) ? fixingReasons(totalMinutes(steps, 'fixing')) : []),
    ...washingReasons(totalMinutes(steps, 'washing')),
    ...(PREWASHED_PROCESSES.has(process) ? prewashReasons(steps) : []),
  ];
}

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
    return [{ code: 'brief-washing', severity: 'advice', message }];
  }
  return [];
}

function prewashReasons(steps: readonly TimedStep[]): RiskReason[] {
  const fixingAt = steps.findIndex((step) => step.stage === 'fixing');
  const prewashAt = steps.findIndex((step) => step.stage === 'prewash');
  if (fixingAt < 0 || (prewashAt >= 0 && prewashAt < fixingAt)) return [];
  return [risk('no-prewash', 'No pre-wash before fixing: free silver nitrate reaches the fixer.')];
}

/** True when any reason breaks a rule (advice alone does not count). */
export function hasProcessingRisk(reasons: readonly RiskReason[]): boolean {
  return reasons.some((reason) => reason.severity === 'risk');
}

function risk(code: RiskReason['code'], message: string): RiskReason {
  return { code, severity: 'risk', message };
}
