import type { ToneStatus } from '../vocabulary';
import { LIGHT_PATCHES, SHADOW_PATCHES } from './patches';
import type { ToneThresholds } from './settings';
import type { PatchTrend } from './trend';

type Kind = 'watch' | 'fading' | 'darkening' | 'yellowing';

/** One rule's value on one patch at the latest check, whether or not it passes. */
export interface RuleMeasure {
  kind: Kind;
  value: number;
  threshold: number;
  /** The measurement's repeatability in the rule's unit (ΔE00, L*, b* or density). */
  margin: number;
}

const CHANGING: ReadonlySet<string> = new Set(['fading', 'darkening', 'yellowing']);

/** Every rule's value per patch (latest check against the first of the series). */
export function ruleMeasures(trend: readonly PatchTrend[], t: ToneThresholds): RuleMeasure[] {
  const lab = t.repeatabilityLab;
  return trend.flatMap((patch) => {
    const first = patch.series[0];
    const last = patch.series[patch.series.length - 1];
    if (!first || !last || first === last) return [];
    const measures: RuleMeasure[] = [
      { kind: 'watch', value: last.dE00, threshold: t.watchDE00, margin: lab },
    ];
    if (SHADOW_PATCHES.has(patch.patch)) {
      measures.push({
        kind: 'fading',
        value: first.density - last.density,
        threshold: t.fadingDensity,
        margin: t.repeatabilityDensity,
      });
    }
    if (LIGHT_PATCHES.has(patch.patch)) {
      measures.push(
        { kind: 'darkening', value: first.L - last.L, threshold: t.darkeningL, margin: lab },
        { kind: 'yellowing', value: last.b - first.b, threshold: t.yellowingB, margin: lab },
      );
    }
    return measures;
  });
}

const rank = (status: ToneStatus) => (status === 'steady' ? 0 : status === 'watch' ? 1 : 2);

const of = (measures: readonly RuleMeasure[], kind: string) =>
  measures.filter((m) => m.kind === kind);

/** Past its threshold by more than the repeatability. */
const clearlyAbove = (m: RuleMeasure) => m.value > m.threshold + m.margin;
/** Under its threshold by more than the repeatability. */
const clearlyBelow = (m: RuleMeasure) => m.value < m.threshold - m.margin;
/** How far past the threshold, counting the repeatability against (−1) or for (+1) it. */
const ratio = (m: RuleMeasure, sign: -1 | 1) => (m.value + sign * m.margin) / m.threshold;

function entersClearly(status: ToneStatus, measures: readonly RuleMeasure[], projected: boolean) {
  if (status === 'steady') return true;
  if (status === 'watch') return projected || of(measures, 'watch').some(clearlyAbove);
  return of(measures, status).some(clearlyAbove);
}

function leavesClearly(
  before: ToneStatus,
  after: ToneStatus,
  measures: readonly RuleMeasure[],
  projected: boolean,
) {
  if (before === 'steady') return true;
  if (before === 'watch') {
    if (CHANGING.has(after)) return true;
    return !projected && of(measures, 'watch').every(clearlyBelow);
  }
  if (CHANGING.has(after)) {
    // From one changing state to another: the new one must lead even with the noise
    // counted against it and for the old one.
    const best = (kind: string, sign: -1 | 1) =>
      Math.max(0, ...of(measures, kind).map((m) => ratio(m, sign)));
    return best(after, -1) > best(before, 1);
  }
  return of(measures, before).every(clearlyBelow);
}

/**
 * Hysteresis: a print keeps its previous status unless the new one is clear of its
 * threshold by more than the measurement's repeatability, and the old one is left by as
 * much. A reading a few hundredths from the last one cannot flip a status (and open an
 * alert) back and forth.
 */
export function settleStatus(
  before: ToneStatus | undefined,
  after: ToneStatus,
  measures: readonly RuleMeasure[],
  projected: boolean,
): ToneStatus {
  if (!before || before === 'unchecked' || after === 'unchecked' || before === after) return after;
  // Going down (yellowing → watch → steady), leaving the old state clearly is enough.
  const entered = rank(after) < rank(before) || entersClearly(after, measures, projected);
  return entered && leavesClearly(before, after, measures, projected) ? after : before;
}
