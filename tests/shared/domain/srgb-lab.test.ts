import Color from 'colorjs.io';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  bradfordAdapt,
  D50_WHITE,
  linearToSrgb,
  srgbToLabD50,
  srgbToLinear,
  xyzToLab,
} from '../../../shared/domain/srgb-lab';

const lab = (rgb: [number, number, number]) => {
  const { L, a, b } = srgbToLabD50(rgb);
  return [L, a, b];
};

describe('sRGB transfer function (IEC 61966-2-1:1999, §5.2)', () => {
  it('is linear below 0.04045 and a 2.4 power above', () => {
    expect(srgbToLinear(0.04)).toBeCloseTo(0.04 / 12.92, 12);
    expect(srgbToLinear(0.5)).toBeCloseTo(((0.5 + 0.055) / 1.055) ** 2.4, 12);
    expect(srgbToLinear(1)).toBeCloseTo(1, 12);
  });

  it('round-trips through the encoding', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (value) => {
        expect(linearToSrgb(srgbToLinear(value))).toBeCloseTo(value, 9);
      }),
    );
  });
});

describe('CIELAB (CIE 15:2004 §8.2.1)', () => {
  it('gives L* 100, a* b* 0 for the reference white', () => {
    const white = xyzToLab(D50_WHITE);
    expect(white.L).toBeCloseTo(100, 10);
    expect(white.a).toBeCloseTo(0, 10);
    expect(white.b).toBeCloseTo(0, 10);
  });

  it('gives L* 50 at Y = 0.1842 (CIE 15 formula, worked by hand: 116·0.18419^(1/3) − 16)', () => {
    expect(xyzToLab([0.96422 * 0.18419, 0.18419, 0.82521 * 0.18419]).L).toBeCloseTo(50, 2);
  });
});

describe('Bradford adaptation D65 → D50 (ICC.1:2010 Annex E)', () => {
  it('carries the D65 white onto the D50 white', () => {
    const adapted = bradfordAdapt([0.95047, 1, 1.08883], [0.95047, 1, 1.08883], D50_WHITE);
    adapted.forEach((value, i) => expect(value).toBeCloseTo(D50_WHITE[i]!, 10));
  });
});

describe('sRGB → CIELAB D50 against colorjs.io 0.7 (its "lab" space is D50, Bradford-adapted)', () => {
  const reference = (rgb: [number, number, number]) =>
    new Color('srgb', rgb).to('lab').coords as number[];

  it('agrees on the primaries and on warm print tones within 0.03', () => {
    const cases: Array<[number, number, number]> = [
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
      [0.5, 0.5, 0.5],
      [0.78, 0.4, 0.2],
      [0.16, 0.1, 0.08],
      [0.93, 0.88, 0.8],
    ];
    for (const rgb of cases) {
      lab(rgb).forEach((value, i) =>
        expect(Math.abs(value - reference(rgb)[i]!)).toBeLessThan(0.03),
      );
    }
  });

  it('agrees everywhere in the cube within 0.05 (the IEC matrix is published to 4 places)', () => {
    fc.assert(
      fc.property(
        fc.tuple(
          fc.double({ min: 0, max: 1, noNaN: true }),
          fc.double({ min: 0, max: 1, noNaN: true }),
          fc.double({ min: 0, max: 1, noNaN: true }),
        ),
        (rgb) => {
          lab(rgb).forEach((value, i) =>
            expect(Math.abs(value - reference(rgb)[i]!)).toBeLessThan(0.05),
          );
        },
      ),
      { numRuns: 300 },
    );
  });

  it('matches the red primary published by Lindbloom’s calculator, D50 Bradford (from memory: 54.29, 80.80, 69.89)', () => {
    const [L, a, b] = lab([1, 0, 0]);
    expect(L).toBeCloseTo(54.29, 1);
    expect(a).toBeCloseTo(80.8, 0);
    expect(b).toBeCloseTo(69.89, 0);
  });
});
