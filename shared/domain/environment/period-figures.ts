import { dewPoint } from './dew-point';
import type { DaySummary } from './daily-summary';
import { expectedLife } from './decay-rate';
import type { StorageBand } from './storage-bands';

/** RH swing of one month: the month's highest minus its lowest reading. */
export interface MonthSwing {
  month: string;
  rhSwing: number;
  temperatureSwing: number;
}

/** A period's figures from its daily summaries (plain names on screen). */
export interface PeriodFigures {
  days: number;
  readings: number;
  meanTemperatureC: number | null;
  meanRh: number | null;
  /** Equivalent constant-climate rate relative to 20 °C / 50 % RH ("ageing speed"). */
  relativeRate: number | null;
  /** 1 / relativeRate ("life multiplier"). */
  lifeMultiplier: number | null;
  /** Expected life in years given `lifeAtReferenceYears` at 20 °C / 50 % RH. */
  expectedLifeYears: number | null;
  /** Dew point of the period's mean air. */
  dewPointC: number | null;
  /** Daily RH swing (max − min within a day): the largest and the mean. */
  dailyRhSwingMax: number | null;
  dailyRhSwingMean: number | null;
  monthly: MonthSwing[];
  /** Days with any part outside the band, by what broke it. */
  daysOutside: { tooWarm: number; tooDamp: number; tooDry: number; swing: number };
}

/**
 * Figures for a period. Means weight every reading alike (sums over counts), so a day
 * logged every 10 minutes and one logged hourly count by their readings.
 */
export function periodFigures(
  days: readonly DaySummary[],
  band: StorageBand,
  lifeAtReferenceYears: number,
): PeriodFigures {
  let readings = 0;
  let tSum = 0;
  let rhSum = 0;
  let rateSum = 0;
  let swingSum = 0;
  let swingMax: number | null = null;
  const outside = { tooWarm: 0, tooDamp: 0, tooDry: 0, swing: 0 };
  const months = new Map<string, { rhMin: number; rhMax: number; tMin: number; tMax: number }>();
  for (const day of days) {
    readings += day.readings;
    tSum += day.tSum;
    rhSum += day.rhSum;
    rateSum += day.rateSum;
    const swing = day.rhMax - day.rhMin;
    swingSum += swing;
    swingMax = swingMax === null ? swing : Math.max(swingMax, swing);
    if (day.tMax > band.maxTemperatureC) outside.tooWarm += 1;
    if (day.rhMax > band.maxRh) outside.tooDamp += 1;
    if (day.rhMin < band.minRh) outside.tooDry += 1;
    if (swing > band.maxDailyRhSwing) outside.swing += 1;
    const key = day.day.slice(0, 7);
    const month = months.get(key);
    if (!month)
      months.set(key, { rhMin: day.rhMin, rhMax: day.rhMax, tMin: day.tMin, tMax: day.tMax });
    else {
      month.rhMin = Math.min(month.rhMin, day.rhMin);
      month.rhMax = Math.max(month.rhMax, day.rhMax);
      month.tMin = Math.min(month.tMin, day.tMin);
      month.tMax = Math.max(month.tMax, day.tMax);
    }
  }
  const has = readings > 0;
  const meanT = has ? tSum / readings : null;
  const meanRh = has ? rhSum / readings : null;
  const rate = has ? rateSum / readings : null;
  return {
    days: days.length,
    readings,
    meanTemperatureC: meanT,
    meanRh,
    relativeRate: rate,
    lifeMultiplier: rate ? 1 / rate : null,
    expectedLifeYears: rate ? expectedLife(rate, lifeAtReferenceYears) : null,
    dewPointC: meanT !== null && meanRh !== null && meanRh > 0 ? dewPoint(meanT, meanRh) : null,
    dailyRhSwingMax: swingMax,
    dailyRhSwingMean: days.length ? swingSum / days.length : null,
    monthly: [...months.entries()]
      .sort(([a], [b]) => (a < b ? -1 : 1))
      .map(([month, m]) => ({
        month,
        rhSwing: m.rhMax - m.rhMin,
        temperatureSwing: m.tMax - m.tMin,
      })),
    daysOutside: outside,
  };
}
