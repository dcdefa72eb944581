import { describe, expect, it } from 'vitest';
import { densityFromLightness } from '../../../../shared/domain/tone/density';
import { DEFAULT_TONE_SETTINGS } from '../../../../shared/domain/tone/settings';
import {
  evaluateTone,
  flagsByRelevance,
  nextCheckDue,
} from '../../../../shared/domain/tone/status';
import { toneTrend } from '../../../../shared/domain/tone/trend';

type R = { patch: string; L: number; a: number; b: number };
const base: R[] = [
  { patch: 'dmax', L: 28, a: 6, b: 10 },
  { patch: 'mid', L: 55, a: 4, b: 12 },
  { patch: 'highlight', L: 88, a: 1, b: 6 },
  { patch: 'dmin', L: 93, a: 0.4, b: 4.1 },
];
const change = (edit: Partial<Record<string, Partial<R>>>): R[] =>
  base.map((r) => ({ ...r, ...edit[r.patch] }));
const evaluate = (later: R[]) =>
  evaluateTone(
    toneTrend(
      [
        { id: 1, checkedOn: '2024-03-02', baseline: true, readings: base },
        { id: 2, checkedOn: '2026-03-02', baseline: false, readings: later },
      ],
      DEFAULT_TONE_SETTINGS.tone.noticeableDE00,
    ),
    DEFAULT_TONE_SETTINGS.tone,
  );

// Thresholds are the defaults: watch ΔE00 1.0 (from memory), noticeable 2.0 (from
// memory), fading 0.05 density, darkening 2.0 L*, yellowing 2.0 b* (chosen by us).
describe('tone status', () => {
  it('unchanged readings are steady', () => {
    expect(evaluate(base)).toMatchObject({ status: 'steady', flags: [] });
  });

  it('bare paper b* +3.1 is yellowing, with the reason in plain words', () => {
    const result = evaluate(change({ dmin: { b: 7.2 } }));
    expect(result.status).toBe('yellowing');
    expect(result.flags.map((f) => f.reason)).toContain('bare paper b* +3.1 since 2024-03-02');
  });

  it('deep shadow L* 28 → 30 loses density 0.058 (≥ 0.05): fading', () => {
    // D = −3 log10((L + 16) / 116) by hand: D(28) = 1.2629, D(30) = 1.2051, loss 0.0579.
    expect(densityFromLightness(28) - densityFromLightness(30)).toBeCloseTo(0.0579, 3);
    const result = evaluate(change({ dmax: { L: 30 } }));
    expect(result.status).toBe('fading');
    expect(result.flags.find((f) => f.kind === 'fading')!.reason).toBe(
      'deepest shadow density −0.058 since 2024-03-02',
    );
  });

  it('highlight L* −2.2 is darkening', () => {
    expect(evaluate(change({ highlight: { L: 85.8 } })).status).toBe('darkening');
  });

  it('several states: the one furthest past its threshold wins, every one listed', () => {
    // yellowing b* +4.0 (2.0× its threshold) beats darkening L* −2.2 (1.1×).
    const result = evaluate(change({ dmin: { b: 8.1 }, highlight: { L: 85.8 } }));
    expect(result.status).toBe('yellowing');
    expect(result.flags.map((f) => f.kind)).toEqual(
      expect.arrayContaining(['darkening', 'yellowing', 'noticeable-change']),
    );
  });

  it('a ΔE00 between 1 and 2 with no directional rule is watch; ≥ 2 also flags noticeable change', () => {
    const watch = evaluate(change({ mid: { a: 5.5 } }));
    expect(watch.status).toBe('watch');
    expect(watch.flags.map((f) => f.kind)).toEqual(['watch']);
    const noticeable = evaluate(change({ mid: { a: 8 } }));
    expect(noticeable.flags.map((f) => f.kind)).toContain('noticeable-change');
  });

  it('a baseline alone is steady; no checks at all is unchecked', () => {
    expect(evaluateTone([], DEFAULT_TONE_SETTINGS.tone).status).toBe('unchecked');
  });
});

describe('next check due (defaults chosen by us: 24, 12, 6 months)', () => {
  const s = DEFAULT_TONE_SETTINGS.schedule;
  it('depends on the status', () => {
    expect(nextCheckDue('2026-03-02', 'steady', s)).toBe('2028-03-02');
    expect(nextCheckDue('2026-03-02', 'watch', s)).toBe('2027-03-02');
    expect(nextCheckDue('2026-03-02', 'yellowing', s)).toBe('2026-09-02');
    expect(nextCheckDue(null, 'unchecked', s)).toBeNull();
  });
});

describe('flags by relevance (our own display order)', () => {
  it('puts the flags behind the status first, then the rest, furthest past threshold first', () => {
    const flag = (kind: 'noticeable-change' | 'yellowing' | 'fading', ratio: number) => ({
      kind,
      patch: 'dmin',
      ratio,
      reason: `${kind} ${ratio}`,
    });
    const ordered = flagsByRelevance('yellowing', [
      flag('noticeable-change', 4),
      flag('fading', 1.2),
      flag('yellowing', 1.5),
      flag('yellowing', 3),
    ]);
    expect(ordered.map((f) => f.reason)).toEqual([
      'yellowing 3',
      'yellowing 1.5',
      'noticeable-change 4',
      'fading 1.2',
    ]);
  });
});
