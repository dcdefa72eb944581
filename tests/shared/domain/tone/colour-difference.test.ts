import { differenceCiede2000 } from 'culori';
import Color from 'colorjs.io';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  deltaE00,
  deltaE76,
  deltaE94,
  labDifference,
} from '../../../../shared/domain/tone/colour-difference';
import { SHARMA_2005_TABLE_1 } from './sharma-2005';

const lab = (L: number, a: number, b: number) => ({ L, a, b });

describe('ΔE00 (CIEDE2000)', () => {
  // Sharma, Wu and Dalal 2005, Color Research and Application 30(1), Table 1: all 34 pairs.
  it.each(SHARMA_2005_TABLE_1.map((row, i) => [i + 1, row] as const))(
    'pair %i of Sharma et al. 2005 Table 1 to 4 decimals',
    (_pair, [L1, a1, b1, L2, a2, b2, expected]) => {
      expect(deltaE00(lab(L1, a1, b1), lab(L2, a2, b2)).toFixed(4)).toBe(expected.toFixed(4));
    },
  );

  it('is not converted between white points: tagging the values D50 (`lab`) in culori would be', () => {
    // The pitfall this module avoids (stack.md 13): culori adapts `lab` (D50) to `lab65`.
    const d50 = differenceCiede2000();
    const drift = SHARMA_2005_TABLE_1.map(([L1, a1, b1, L2, a2, b2, expected]) =>
      Math.abs(
        d50({ mode: 'lab', l: L1, a: a1, b: b1 }, { mode: 'lab', l: L2, a: a2, b: b2 }) - expected,
      ),
    );
    expect(Math.max(...drift)).toBeGreaterThan(0.01);
  });

  it('agrees with colorjs.io, an independent library, on random pairs', () => {
    // colorjs.io 0.7.1's `lab` space is D50; both colours in it, so it converts nothing.
    // Readings at the instruments' 0.01 resolution. Finer values are not compared:
    // colorjs.io counts any |a*|, |b*| < 0.0025 as neutral (its lch ε), CIEDE2000 does not.
    const hundredths = (min: number, max: number) =>
      fc.integer({ min: min * 100, max: max * 100 }).map((n) => n / 100);
    const labArb = fc.record({
      L: hundredths(0, 100),
      a: hundredths(-128, 128),
      b: hundredths(-128, 128),
    });
    // Sharma, Wu and Dalal 2005 (§3, "discontinuities") show ΔE00 jumps where the two hues
    // are exactly 180° apart: which side of the tie a library lands on is down to rounding
    // (culori works in radians, colorjs.io in degrees), so antiparallel a*b* pairs are left out.
    const antiparallel = (x: { a: number; b: number }, y: { a: number; b: number }) =>
      Math.abs(x.a * y.b - x.b * y.a) <= 1e-9 * Math.hypot(x.a, x.b) * Math.hypot(y.a, y.b) &&
      x.a * y.a + x.b * y.b < 0;
    fc.assert(
      fc.property(labArb, labArb, (x, y) => {
        fc.pre(!antiparallel(x, y));
        const cx = new Color('lab', [x.L, x.a, x.b]);
        const cy = new Color('lab', [y.L, y.a, y.b]);
        expect(deltaE00(x, y)).toBeCloseTo(cx.deltaE(cy, '2000'), 9);
        expect(deltaE76(x, y)).toBeCloseTo(cx.deltaE(cy, '76'), 9);
      }),
      { numRuns: 500 },
    );
  });
});

describe('ΔE*94 (graphic arts) and ΔE*ab', () => {
  // Worked values from Bruce Lindbloom's colour-difference calculator (brucelindbloom.com,
  // "Delta E (CIE 1994)", graphic arts), first colour the reference.
  it('matches published worked values', () => {
    expect(deltaE94(lab(100, -50, 50), lab(20, 10, -20))).toBeCloseTo(89.358114, 5);
    expect(deltaE94(lab(10.3454, 3.2151, -189.123), lab(51.7781, -22.5151, 1.0001))).toBeCloseTo(
      51.361909,
      5,
    );
    expect(deltaE94(lab(100, 0, 0), lab(0, 0, 0))).toBeCloseTo(100, 9);
  });

  it('ΔE*ab is the Euclidean distance (CIE 15:2004 §8.2.3): a 3-4-0 step gives 5', () => {
    expect(deltaE76(lab(50, 0, 0), lab(50, 3, 4))).toBeCloseTo(5, 12);
  });

  it('reports the deltas as sample minus reference', () => {
    const d = labDifference(lab(93, 0.4, 4.1), lab(92, 0.6, 7.2));
    expect(d.dL).toBeCloseTo(-1, 12);
    expect(d.da).toBeCloseTo(0.2, 12);
    expect(d.db).toBeCloseTo(3.1, 12);
  });
});
