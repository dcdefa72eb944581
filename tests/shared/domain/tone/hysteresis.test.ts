import { describe, expect, it } from 'vitest';
import { densityFromLightness } from '../../../../shared/domain/tone/density';
import { DEFAULT_TONE_SETTINGS } from '../../../../shared/domain/tone/settings';
import { evaluateTone } from '../../../../shared/domain/tone/status';
import { toneTrend } from '../../../../shared/domain/tone/trend';
import type { ToneStatus } from '../../../../shared/domain/vocabulary';

type R = { patch: string; L: number; a: number; b: number };
const base: R[] = [
  { patch: 'dmax', L: 28, a: 6, b: 10 },
  { patch: 'dmin', L: 93, a: 0.4, b: 4.1 },
];
const later = (dmaxL: number, dminB: number): R[] => [
  { patch: 'dmax', L: dmaxL, a: 6, b: 10 },
  { patch: 'dmin', L: 93, a: 0.4, b: dminB },
];
const evaluate = (readings: R[], previous?: ToneStatus) =>
  evaluateTone(
    toneTrend(
      [
        { id: 1, checkedOn: '2024-03-02', baseline: true, readings: base },
        { id: 2, checkedOn: '2026-03-02', baseline: false, readings },
      ],
      DEFAULT_TONE_SETTINGS.tone.noticeableDE00,
    ),
    DEFAULT_TONE_SETTINGS.tone,
    previous,
  ).status;

// A threshold with a dead band as wide as the measurement's repeatability (the hysteresis of
// a thermostat: common practice). Repeatability defaults: 0.3 in CIELAB units, 0.01 density
// (from memory, see settings.ts). Density by CIE 15 (D(28) − D(30) = 0.0579, by hand).
describe('status hysteresis', () => {
  it('a bare-paper b* 0.03 lower does not turn a yellowing print into a fading one', () => {
    expect(densityFromLightness(28) - densityFromLightness(30)).toBeCloseTo(0.0579, 3);
    // b* +2.33 (1.165× its threshold) against density −0.058 (1.158×): yellowing.
    expect(evaluate(later(30, 6.43), 'steady')).toBe('yellowing');
    // b* +2.30 (1.150×): fading now leads, but only by noise; the print stays yellowing.
    expect(evaluate(later(30, 6.4))).toBe('fading');
    expect(evaluate(later(30, 6.4), 'yellowing')).toBe('yellowing');
  });

  it('enters a state only past its threshold by more than the repeatability', () => {
    expect(evaluate(later(28, 6.2), 'steady')).toBe('steady'); // b* +2.1 ≤ 2.0 + 0.3
    expect(evaluate(later(28, 6.5), 'steady')).toBe('yellowing'); // b* +2.4
  });

  it('leaves a state only below its threshold by more than the repeatability', () => {
    expect(evaluate(later(28, 5.9), 'yellowing')).toBe('yellowing'); // b* +1.8 ≥ 2.0 − 0.3
    expect(evaluate(later(28, 5.6), 'yellowing')).not.toBe('yellowing'); // b* +1.5
  });

  it('with no status stored (first evaluation) the rules apply as they are', () => {
    expect(evaluate(later(28, 6.2))).toBe('yellowing');
  });
});
