import { describe, expect, it } from 'vitest';
import { summariseDays, type Reading } from '../../../../shared/domain/environment/daily-summary';
import { relativeDecayRate } from '../../../../shared/domain/environment/decay-rate';
import { excursions } from '../../../../shared/domain/environment/excursions';
import { periodFigures } from '../../../../shared/domain/environment/period-figures';
import {
  bandForProcesses,
  MEDIUM_TERM,
  SILVER_EXTENDED,
} from '../../../../shared/domain/environment/storage-bands';

const HOUR = 3_600_000;
const start = Date.UTC(2026, 0, 31, 0, 0, 0);
const reading = (hour: number, temperatureC: number, rh: number): Reading => ({
  at: start + hour * HOUR,
  day: new Date(start + hour * HOUR).toISOString().slice(0, 10),
  temperatureC,
  rh,
});

describe('daily summaries and period figures', () => {
  const readings = [
    reading(0, 16, 40),
    reading(12, 18, 50),
    reading(24, 20, 44),
    reading(36, 22, 60),
  ];
  const days = summariseDays(readings);

  it('keeps min, max and sums per day', () => {
    expect(days.map((d) => d.day)).toEqual(['2026-01-31', '2026-02-01']);
    expect(days[0]).toMatchObject({ readings: 2, tMin: 16, tMax: 18, rhMin: 40, rhMax: 50 });
  });

  it('weights every reading alike and takes the mean of the rates, not the rate of the mean', () => {
    const figures = periodFigures(days, SILVER_EXTENDED, 100);
    expect(figures.meanTemperatureC).toBe(19);
    expect(figures.meanRh).toBe(48.5);
    const rates = readings.map((r) => relativeDecayRate(r.temperatureC, r.rh));
    const mean = rates.reduce((s, v) => s + v, 0) / rates.length;
    expect(figures.relativeRate).toBeCloseTo(mean, 12);
    expect(figures.relativeRate).not.toBeCloseTo(relativeDecayRate(19, 48.5), 3);
    expect(figures.expectedLifeYears).toBeCloseTo(100 / mean, 9);
  });

  it('reports daily and monthly humidity swings and days outside the band', () => {
    const figures = periodFigures(days, SILVER_EXTENDED, 100);
    expect(figures.dailyRhSwingMax).toBe(16);
    expect(figures.dailyRhSwingMean).toBe(13);
    expect(figures.monthly).toEqual([
      { month: '2026-01', rhSwing: 10, temperatureSwing: 2 },
      { month: '2026-02', rhSwing: 16, temperatureSwing: 2 },
    ]);
    // Day 2 reaches 22 °C (above 18) and 60 % (above 50) and swings 16 points (above 10).
    expect(figures.daysOutside).toEqual({ tooWarm: 1, tooDamp: 1, tooDry: 0, swing: 1 });
  });
});

describe('storage bands (ISO 18920, values from memory)', () => {
  it('a place holding any silver image takes the silver band', () => {
    expect(bandForProcesses(['cyanotype', 'salt print'])).toBe(SILVER_EXTENDED);
    expect(bandForProcesses(['cyanotype'])).toBe(MEDIUM_TERM);
    expect(bandForProcesses([])).toBe(MEDIUM_TERM);
  });
});

describe('excursions', () => {
  it('opens only for a stretch outside the band at least as long as the set time', () => {
    const hours = [
      reading(0, 17, 45),
      reading(1, 17, 55),
      reading(2, 17, 56),
      reading(3, 17, 57),
      reading(4, 17, 45),
      reading(5, 17, 58),
      reading(6, 17, 45),
    ];
    const found = excursions(hours, SILVER_EXTENDED, 2);
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ breach: 'too-damp', hours: 2, readings: 3, worst: 57 });
    expect(excursions(hours, SILVER_EXTENDED, 3)).toHaveLength(0);
  });

  it('a logger pause splits a stretch', () => {
    const gappy = [
      reading(0, 17, 55),
      reading(1, 17, 55),
      reading(10, 17, 55),
      reading(11, 17, 55),
    ];
    expect(excursions(gappy, SILVER_EXTENDED, 2)).toHaveLength(0);
  });
});
