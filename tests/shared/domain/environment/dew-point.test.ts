import { describe, expect, it } from 'vitest';
import {
  dewPoint,
  saturationVapourPressure,
} from '../../../../shared/domain/environment/dew-point';

// Magnus formula, Alduchov & Eskridge 1996 constants (b = 17.625, c = 243.04 °C).
describe('dew point (Magnus, Alduchov & Eskridge 1996)', () => {
  it('20 °C at 50 % RH has a dew point of 9.3 °C (psychrometric tables, from memory)', () => {
    expect(dewPoint(20, 50)).toBeCloseTo(9.26, 2);
    expect(Math.round(dewPoint(20, 50) * 10) / 10).toBe(9.3);
  });

  it('worked by hand: γ = ln(0.6) + 17.625·25/268.04 → Td(25 °C, 60 %) = 16.70 °C', () => {
    expect(dewPoint(25, 60)).toBeCloseTo(16.7, 2);
  });

  it('agrees with the WMO Magnus constants (17.62, 243.12; as pvlib documents) within 0.05 °C', () => {
    for (const [t, rh] of [
      [5, 80],
      [20, 50],
      [24, 62],
      [30, 80],
    ] as const) {
      expect(Math.abs(dewPoint(t, rh) - dewPoint(t, rh, { b: 17.62, c: 243.12 }))).toBeLessThan(
        0.05,
      );
    }
  });

  it('at 100 % RH the dew point is the air temperature (definition)', () => {
    expect(dewPoint(18, 100)).toBeCloseTo(18, 10);
  });

  it('saturation vapour pressure at 20 °C is within 0.5 % of the steam tables’ 23.39 hPa (IAPWS, from memory)', () => {
    expect(Math.abs(saturationVapourPressure(20) / 23.39 - 1)).toBeLessThan(0.005);
  });
});
