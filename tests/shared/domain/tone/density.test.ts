import { describe, expect, it } from 'vitest';
import {
  densityFromLightness,
  lightnessFromLuminance,
  luminanceFromLightness,
} from '../../../../shared/domain/tone/density';

// CIE 15:2004 §8.2.1: L* = 116 (Y/Yn)^(1/3) − 16 above Y/Yn = (6/29)^3 ≈ 0.008856,
// 903.3 · Y/Yn below it.
describe('L* and Y (CIE 15:2004)', () => {
  it('L* = 50 is Y = 18.42 %', () => {
    expect(luminanceFromLightness(50)).toBeCloseTo(0.1842, 4);
    expect(lightnessFromLuminance(0.1842)).toBeCloseTo(50, 2);
  });

  it('the white is Y = 1 at L* = 100; black is 0', () => {
    expect(luminanceFromLightness(100)).toBeCloseTo(1, 12);
    expect(luminanceFromLightness(0)).toBeCloseTo(0, 12);
  });

  it('below the joint the linear part holds: L* = 903.3 · Y', () => {
    expect(lightnessFromLuminance(0.005)).toBeCloseTo(903.3 * 0.005, 1);
    expect(lightnessFromLuminance(0.008856)).toBeCloseTo(8.0, 2);
  });

  it('round-trips over the whole range', () => {
    for (let L = 0; L <= 100; L += 2.5) {
      expect(lightnessFromLuminance(luminanceFromLightness(L))).toBeCloseTo(L, 9);
    }
  });
});

describe('visual reflection density', () => {
  it('L* = 50 has D ≈ 0.735 (−log10 0.1842, as the issue states)', () => {
    expect(densityFromLightness(50)).toBeCloseTo(0.735, 3);
  });

  it('paper white L* = 100 has D = 0; a deep shadow of L* 20 about 1.52', () => {
    expect(densityFromLightness(100)).toBeCloseTo(0, 12);
    // Y(20) = ((20 + 16) / 116)^3 = 0.02989, −log10 → 1.5245 (worked by hand).
    expect(densityFromLightness(20)).toBeCloseTo(1.5245, 4);
  });
});
