import { describe, expect, it } from 'vitest';
import {
  equivalentRate,
  expectedLife,
  relativeDecayRate,
} from '../../../../shared/domain/environment/decay-rate';

// The isoperm form (Sebera 1994) as ConSciR's `calcLM` documents it:
// LM = (50/RH)^1.3 · exp[(Ea/R)(1/T − 1/T₀)], Ea = 100 kJ/mol, R = 8.314 J/(mol·K).
// Expected values below are that equation worked by hand (T₀ = 293.15 K).
describe('relative decay rate (isoperm approach, Sebera 1994)', () => {
  it('is 1 at the reference climate, 20 °C and 50 % RH', () => {
    expect(relativeDecayRate(20, 50)).toBeCloseTo(1, 12);
  });

  it('at 25 °C / 50 % RH: exp(−(100000/8.314462618)(1/298.15 − 1/293.15)) = 1.9898', () => {
    expect(relativeDecayRate(25, 50)).toBeCloseTo(1.9898, 4);
  });

  it('roughly doubles for each 5 °C warmer near room temperature (common practice)', () => {
    expect(relativeDecayRate(25, 50) / relativeDecayRate(20, 50)).toBeGreaterThan(1.8);
    expect(relativeDecayRate(25, 50) / relativeDecayRate(20, 50)).toBeLessThan(2.2);
    expect(relativeDecayRate(15, 50)).toBeCloseTo(0.4907, 4);
  });

  it('at 20 °C / 25 % RH: (25/50)^1.3 = 0.4061, a life multiplier of 2.462', () => {
    expect(relativeDecayRate(20, 25)).toBeCloseTo(0.4061, 4);
    expect(1 / relativeDecayRate(20, 25)).toBeCloseTo(2.462, 3);
  });

  it('a warm damp cabinet, 24 °C / 62 % RH, ages 2.30 times as fast', () => {
    expect(relativeDecayRate(24, 62)).toBeCloseTo(2.2977, 4);
  });

  it('matches ConSciR’s published form with its T₀ = 293 K within the rounding of T₀', () => {
    const consciR = (t: number, rh: number) =>
      1 / ((50 / rh) ** 1.3 * Math.exp((100000 / 8.314) * (1 / (t + 273.15) - 1 / 293)));
    for (const [t, rh] of [
      [10, 40],
      [18, 45],
      [25, 60],
      [30, 70],
    ] as const) {
      expect(relativeDecayRate(t, rh) / consciR(t, rh)).toBeGreaterThan(0.97);
      expect(relativeDecayRate(t, rh) / consciR(t, rh)).toBeLessThan(1.03);
    }
  });
});

describe('expected life and the equivalent constant climate', () => {
  it('a rate of 2 halves the life stated at 20 °C / 50 % RH', () => {
    expect(expectedLife(2, 100)).toBe(50);
  });

  it('half a year at 10 °C and half at 30 °C is not the same as a year at 20 °C', () => {
    // Damage adds up as ∫ rate dt: the equivalent rate is the mean of the rates.
    const cold = relativeDecayRate(10, 50);
    const warm = relativeDecayRate(30, 50);
    const rate = equivalentRate([cold, warm])!;
    expect(rate).toBeCloseTo((cold + warm) / 2, 12);
    expect(rate).toBeGreaterThan(relativeDecayRate(20, 50) * 1.2);
    // Its life multiplier is the harmonic mean of the two multipliers.
    const harmonic = 2 / (1 / (1 / cold) + 1 / (1 / warm));
    expect(1 / rate).toBeCloseTo(harmonic, 12);
  });

  it('weights by duration: three days warm and one cold count three to one', () => {
    expect(equivalentRate([4, 0], [3, 1])).toBe(3);
    expect(equivalentRate([])).toBeNull();
  });
});
