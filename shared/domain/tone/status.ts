import type { ToneStatus } from '../vocabulary';
import { addMonths, daysBetween } from './dates';
import { ruleMeasures, settleStatus } from './hysteresis';
import { DENSITY_DIGITS, signedFixed } from './numbers';
import { LIGHT_PATCHES, patchName, SHADOW_PATCHES } from './patches';
import type { CheckSchedule, ToneThresholds } from './settings';
import type { PatchTrend } from './trend';

export type ToneFlagKind = 'noticeable-change' | 'watch' | 'fading' | 'darkening' | 'yellowing';

export interface ToneFlag {
  kind: ToneFlagKind;
  patch: string;
  /** How far past its threshold: value / threshold (≥ 1). */
  ratio: number;
  reason: string;
}

export interface ToneEvaluation {
  status: ToneStatus;
  flags: ToneFlag[];
  /** Larger is more urgent; orders the tone-watch list. */
  urgency: number;
}

const CHANGING: ReadonlySet<ToneFlagKind> = new Set(['fading', 'darkening', 'yellowing']);

const signed = signedFixed;

/**
 * The status of a print from its trend. Every rule that holds becomes a flag with a plain
 * reason. The status is the changing state (fading, darkening, yellowing) furthest past its
 * threshold; failing those `watch`; else `steady`. `noticeable-change` is a flag only.
 * Flags come in the order a reader needs them (`flagsByRelevance`).
 */
export function evaluateTone(
  trend: readonly PatchTrend[],
  thresholds: ToneThresholds,
  /** The stored status before this evaluation: it stands unless the new one is clear. */
  previous?: ToneStatus,
): ToneEvaluation {
  const raw = classify(trend, thresholds);
  const projected = raw.flags.some((f) => f.kind === 'watch' && f.reason.includes('projected'));
  const status = settleStatus(previous, raw.status, ruleMeasures(trend, thresholds), projected);
  if (status === raw.status) return raw;
  const own = raw.flags.filter((flag) => flag.kind === status).map((flag) => flag.ratio);
  const base = status === 'steady' ? 100 : status === 'watch' ? 200 : 300;
  return {
    status,
    flags: flagsByRelevance(status, raw.flags),
    urgency: base + (own.length > 0 ? Math.max(...own) : 1),
  };
}

function classify(trend: readonly PatchTrend[], thresholds: ToneThresholds): ToneEvaluation {
  if (trend.length === 0) return { status: 'unchecked', flags: [], urgency: 0 };
  const flags = trend.flatMap((patch) => patchFlags(patch, thresholds));
  const changing = flags
    .filter((flag) => CHANGING.has(flag.kind))
    .sort((x, y) => y.ratio - x.ratio);
  const top = changing[0];
  if (top) {
    const status = top.kind as ToneStatus;
    return { status, flags: flagsByRelevance(status, flags), urgency: 300 + top.ratio };
  }
  // Noticeable-change ratios are against the larger threshold; rank them against watch's.
  const watchRatios = flags.flatMap((flag) =>
    flag.kind === 'watch'
      ? [flag.ratio]
      : flag.kind === 'noticeable-change'
        ? [(flag.ratio * thresholds.noticeableDE00) / thresholds.watchDE00]
        : [],
  );
  if (watchRatios.length > 0) {
    return {
      status: 'watch',
      flags: flagsByRelevance('watch', flags),
      urgency: 200 + Math.max(...watchRatios),
    };
  }
  return { status: 'steady', flags, urgency: 100 };
}

function patchFlags(trend: PatchTrend, t: ToneThresholds): ToneFlag[] {
  const first = trend.series[0];
  const last = trend.series[trend.series.length - 1];
  if (!first || !last || first === last) return [];
  const name = patchName(trend.patch);
  const since = `since ${first.checkedOn}`;
  const flags: ToneFlag[] = [];
  const add = (kind: ToneFlagKind, value: number, threshold: number, reason: string) => {
    if (value >= threshold)
      flags.push({ kind, patch: trend.patch, ratio: value / threshold, reason });
  };
  const dE = last.dE00;
  add(
    'noticeable-change',
    dE,
    t.noticeableDE00,
    `${name} ΔE00 ${dE.toFixed(1)} ${since}: noticeable`,
  );
  // A noticeable change already says more than watch; one reason per patch is enough.
  if (dE < t.noticeableDE00)
    add('watch', dE, t.watchDE00, `${name} ΔE00 ${dE.toFixed(1)} ${since}`);
  const projected = trend.projectedNoticeableOn;
  if (dE < t.watchDE00 && projected && projected > last.checkedOn) {
    const years = daysBetween(last.checkedOn, projected) / 365.25;
    if (years <= t.projectionYears) {
      flags.push({
        kind: 'watch',
        patch: trend.patch,
        ratio: 1,
        reason: `${name} ΔE00 projected to reach ${t.noticeableDE00.toFixed(1)} by ${projected}`,
      });
    }
  }
  if (SHADOW_PATCHES.has(trend.patch)) {
    const loss = first.density - last.density;
    add(
      'fading',
      loss,
      t.fadingDensity,
      `${name} density ${signed(-loss, DENSITY_DIGITS)} ${since}`,
    );
  }
  if (LIGHT_PATCHES.has(trend.patch)) {
    const dL = last.L - first.L;
    add('darkening', -dL, t.darkeningL, `${name} L* ${signed(dL, 1)} ${since}`);
    const db = last.b - first.b;
    add('yellowing', db, t.yellowingB, `${name} b* ${signed(db, 1)} ${since}`);
  }
  return flags;
}

/** The next check: months after the last one, by status (unchecked prints have none due). */
export function nextCheckDue(
  lastCheckedOn: string | null,
  status: ToneStatus,
  schedule: CheckSchedule,
): string | null {
  if (!lastCheckedOn || status === 'unchecked') return null;
  const months =
    status === 'steady'
      ? schedule.steadyMonths
      : status === 'watch'
        ? schedule.watchMonths
        : schedule.changingMonths;
  return addMonths(lastCheckedOn, months);
}

/**
 * Flags in the order a reader needs them: those that gave the print its status first, then
 * the rest; within each, the furthest past its threshold first.
 */
export function flagsByRelevance(status: string, flags: readonly ToneFlag[]): ToneFlag[] {
  const rank = (flag: ToneFlag) => (flag.kind === status ? 0 : 1);
  return [...flags].sort((a, b) => rank(a) - rank(b) || b.ratio - a.ratio);
}
