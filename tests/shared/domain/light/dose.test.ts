import { describe, expect, it } from 'vitest';
import {
  daysInclusive,
  doseByYear,
  excessOverLimit,
  lightHistory,
  luxHours,
} from '../../../../shared/domain/light/dose';
import { annualLimitFor, defaultLightSettings } from '../../../../shared/domain/light/settings';

describe('light dose (lux hours worked by hand)', () => {
  it('counts both ends of a period', () => {
    // 1 to 31 March: 31 days; a one-day showing is one day.
    expect(daysInclusive('2026-03-01', '2026-03-31')).toBe(31);
    expect(daysInclusive('2026-03-01', '2026-03-01')).toBe(1);
    // 2024 is a leap year: 1 February to 1 March is 29 + 1 = 30 days.
    expect(daysInclusive('2024-02-01', '2024-03-01')).toBe(30);
  });

  it('is illuminance × hours a day × days', () => {
    // By hand: 50 lx × 8 h × 90 days = 36,000 lx·h.
    expect(luxHours(50, 8, 90)).toBe(36_000);
    // By hand: 50 lx × 6 h × 31 days (March) = 9,300 lx·h.
    expect(
      doseByYear([{ startsOn: '2026-03-01', endsOn: '2026-03-31', lux: 50, hoursPerDay: 6 }]),
    ).toEqual(new Map([[2026, 9_300]]));
  });

  it('splits a show over New Year between the two years', () => {
    // 15 to 31 December: 17 days × 50 lx × 8 h = 6,800; 1 to 10 January: 10 × 400 = 4,000.
    const byYear = doseByYear([
      { startsOn: '2025-12-15', endsOn: '2026-01-10', lux: 50, hoursPerDay: 8 },
    ]);
    expect(byYear).toEqual(
      new Map([
        [2025, 6_800],
        [2026, 4_000],
      ]),
    );
    const history = lightHistory(
      [
        { startsOn: '2025-12-15', endsOn: '2026-01-10', lux: 50, hoursPerDay: 8 },
        { startsOn: '2020-06-01', endsOn: '2020-06-30', lux: 100, hoursPerDay: 10 },
      ],
      15_000,
    );
    // 2020: 30 days × 100 lx × 10 h = 30,000. Lifetime 30,000 + 6,800 + 4,000 = 40,800.
    expect(history.lifetimeLuxHours).toBe(40_800);
    expect(history.years.map((year) => year.year)).toEqual([2020, 2025, 2026]);
    expect(history.years[0]).toEqual({ year: 2020, luxHours: 30_000, limit: 15_000 });
  });

  it('says by how much a planned show would pass the annual limit', () => {
    // Already 9,300 lx·h in 2026; planned 50 lx × 8 h × 30 days (June) = 12,000 → 21,300,
    // which is 6,300 past a limit of 15,000.
    const already = [{ startsOn: '2026-03-01', endsOn: '2026-03-31', lux: 50, hoursPerDay: 6 }];
    const planned = { startsOn: '2026-06-01', endsOn: '2026-06-30', lux: 50, hoursPerDay: 8 };
    expect(excessOverLimit(already, planned, 15_000)).toEqual([
      {
        year: 2026,
        alreadyLuxHours: 9_300,
        plannedLuxHours: 12_000,
        limit: 15_000,
        overBy: 6_300,
      },
    ]);
    // The same show alone stays within the limit.
    expect(excessOverLimit([], planned, 15_000)).toEqual([]);
  });

  it('takes salt and albumen limits from CIE 157:2004 (high responsivity, 15,000 lx·h a year)', () => {
    // CIE 157:2004, Control of damage to museum objects by optical radiation: highly
    // responsive materials 15,000 lx·h a year; medium 150,000 (values from memory).
    const settings = defaultLightSettings();
    expect(annualLimitFor('salt print', settings)).toBe(15_000);
    expect(annualLimitFor('albumen print', settings)).toBe(15_000);
    expect(annualLimitFor('platinum/palladium print', settings)).toBe(150_000);
    // A year at the standard's 50 lx for 300 days of 8 hours is 120,000 lx·h: eight times
    // the limit, which is why highly responsive prints rotate off display.
    expect(luxHours(50, 8, 300) / annualLimitFor('salt print', settings)).toBe(8);
  });
});
