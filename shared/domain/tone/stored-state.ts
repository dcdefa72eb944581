import type { ToneStatus } from '../vocabulary';
import type { CheckWithReadings } from './trend';
import { evaluatePrintChecks, type PrintToneState } from './evaluate';
import type { ToneSettings } from './settings';

/**
 * A print's tone state as the prints table keeps it (JSON columns as their text). The one
 * definition of what is stored: one print after a check and every print after a settings
 * change both go through `nextStoredTone`, so the two can never drift apart.
 */
export interface StoredTone {
  status: ToneStatus;
  /** JSON of the flags, most relevant first. */
  flags: string;
  urgency: number;
  nextCheckDue: string | null;
  baselineOn: string | null;
  ratePerYear: number | null;
  /** JSON of the small line; null on a print not evaluated since it was added. */
  sparkline: string | null;
}

/** The stored form of an evaluation. */
export function storedToneOf(state: PrintToneState): StoredTone {
  return {
    status: state.status,
    flags: JSON.stringify(state.flags),
    urgency: state.urgency,
    nextCheckDue: state.nextCheckDue,
    baselineOn: state.baselineOn,
    ratePerYear: state.ratePerYear,
    sparkline: JSON.stringify(state.sparkline),
  };
}

/** Whether storing `next` would change anything the print keeps. */
export function storedToneDiffers(stored: StoredTone, next: StoredTone): boolean {
  return (
    stored.status !== next.status ||
    stored.flags !== next.flags ||
    stored.urgency !== next.urgency ||
    stored.nextCheckDue !== next.nextCheckDue ||
    stored.baselineOn !== next.baselineOn ||
    stored.ratePerYear !== next.ratePerYear ||
    stored.sparkline !== next.sparkline
  );
}

/** Why an alert opens when a print's status changes; from `unchecked` nothing opens. */
export function statusChangeAlert(
  before: ToneStatus,
  state: Pick<PrintToneState, 'status' | 'flags'>,
): { kind: string; reason: string } | null {
  if (before === state.status || before === 'unchecked' || state.status === 'unchecked') {
    return null;
  }
  const top = state.flags.find((flag) => flag.kind === state.status);
  const detail = top ? `: ${top.reason}` : '';
  return { kind: state.status, reason: `${statusChangeWords(before, state.status)}${detail}` };
}

/** A status as it reads after "was" or "now": "on watch", "fading". */
const STATUS_WORDS: Record<ToneStatus, string> = {
  unchecked: 'not yet checked',
  steady: 'steady',
  watch: 'on watch',
  fading: 'fading',
  darkening: 'darkening',
  yellowing: 'yellowing',
};

/**
 * A change of tone status in plain words: "Tone back to steady (was on watch)", "Tone put
 * on watch (was steady)", "Tone eased to watch (was fading)", "Tone now fading (was steady)".
 */
export function statusChangeWords(before: ToneStatus, after: ToneStatus): string {
  const was = `(was ${STATUS_WORDS[before]})`;
  if (after === 'steady') return `Tone back to steady ${was}`;
  if (after === 'watch') {
    return before === 'steady' ? `Tone put on watch ${was}` : `Tone eased to watch ${was}`;
  }
  return `Tone now ${STATUS_WORDS[after]} ${was}`;
}

export interface NextStoredTone {
  state: PrintToneState;
  stored: StoredTone;
  /** Something the print keeps moved: write it (and re-index it). */
  changed: boolean;
  /** The baseline date moved: the processing-risk reasons depend on it. */
  baselineMoved: boolean;
  /** The alert the status change opens, if any (before checking for an open one). */
  alert: { kind: string; reason: string } | null;
}

/**
 * Everything a print's tone evaluation decides, from its checks, the settings and what it
 * stores now (the stored status stands unless the new one is clear: hysteresis).
 */
export function nextStoredTone(
  current: StoredTone,
  checks: readonly CheckWithReadings[],
  settings: ToneSettings,
): NextStoredTone {
  const state = evaluatePrintChecks(checks, settings, current.status);
  const stored = storedToneOf(state);
  return {
    state,
    stored,
    changed: storedToneDiffers(current, stored),
    baselineMoved: current.baselineOn !== stored.baselineOn,
    alert: statusChangeAlert(current.status, state),
  };
}
