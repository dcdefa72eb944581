import { relativeDecayRate } from './decay-rate';

/** One logged reading: when (ms since the epoch, UTC), its local day, °C and % RH. */
export interface Reading {
  at: number;
  day: string;
  temperatureC: number;
  rh: number;
}

/**
 * A day's summary, kept so a year's figures read 365 rows, not 52,560. Sums, not means, so
 * days merge and periods weight each reading alike.
 */
export interface DaySummary {
  day: string;
  readings: number;
  tMin: number;
  tMax: number;
  tSum: number;
  rhMin: number;
  rhMax: number;
  rhSum: number;
  /** Sum of each reading's relative decay rate (decay-rate.ts). */
  rateSum: number;
}

/** Summaries per local day of readings in any order; days come out in date order. */
export function summariseDays(readings: Iterable<Reading>): DaySummary[] {
  const days = new Map<string, DaySummary>();
  for (const r of readings) {
    const rate = relativeDecayRate(r.temperatureC, r.rh);
    const day = days.get(r.day);
    if (!day) {
      days.set(r.day, {
        day: r.day,
        readings: 1,
        tMin: r.temperatureC,
        tMax: r.temperatureC,
        tSum: r.temperatureC,
        rhMin: r.rh,
        rhMax: r.rh,
        rhSum: r.rh,
        rateSum: rate,
      });
      continue;
    }
    day.readings += 1;
    day.tMin = Math.min(day.tMin, r.temperatureC);
    day.tMax = Math.max(day.tMax, r.temperatureC);
    day.tSum += r.temperatureC;
    day.rhMin = Math.min(day.rhMin, r.rh);
    day.rhMax = Math.max(day.rhMax, r.rh);
    day.rhSum += r.rh;
    day.rateSum += rate;
  }
  return [...days.values()].sort((a, b) => (a.day < b.day ? -1 : a.day > b.day ? 1 : 0));
}
