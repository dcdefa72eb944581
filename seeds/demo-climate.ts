import { relativeDecayRate } from '../shared/domain/environment/decay-rate';
import type { Reading } from '../shared/domain/environment/daily-summary';
import type { Random } from './random';

/*
 * The demo places' air (invented). Temperature and RH follow a yearly wave peaking in late
 * July and a daily wave peaking mid-afternoon, with a little noise:
 *
 *   value = mean + season · sin(2π (day − 105) / 365) + daily · sin(2π (hour − 9) / 24) + noise
 *
 * Cabinet 1 is the store's cool, dry cabinet; Cabinet 2 stands against the boiler-room wall
 * and is warm and damp. The store room and the reading room log their own air; drawers and
 * boxes have no loggers and show their cabinet's readings.
 */
export interface Climate {
  meanT: number;
  seasonT: number;
  dailyT: number;
  meanRh: number;
  seasonRh: number;
  dailyRh: number;
}

export const DEMO_CLIMATES: Record<string, Climate> = {
  SR: { meanT: 17, seasonT: 2.5, dailyT: 0.4, meanRh: 43, seasonRh: 5, dailyRh: 2 },
  'SR-C1': { meanT: 16.5, seasonT: 1.5, dailyT: 0.2, meanRh: 40, seasonRh: 3, dailyRh: 1 },
  'SR-C2': { meanT: 22, seasonT: 2.5, dailyT: 0.8, meanRh: 57, seasonRh: 6, dailyRh: 4 },
  RR: { meanT: 20.5, seasonT: 2, dailyT: 1.5, meanRh: 45, seasonRh: 7, dailyRh: 6 },
};

/** The cabinet the demo tone model's rates belong to (demo-tone.ts). */
export const REFERENCE_CLIMATE = 'SR-C1';

const DAY = 86_400_000;

/** The climate's value at an instant, without noise. */
function at(climate: Climate, ms: number): [number, number] {
  const dayOfYear = (ms - Date.UTC(new Date(ms).getUTCFullYear(), 0, 1)) / DAY;
  const hour = (ms % DAY) / 3_600_000;
  const season = Math.sin((2 * Math.PI * (dayOfYear - 105)) / 365);
  const daily = Math.sin((2 * Math.PI * (hour - 9)) / 24);
  return [
    climate.meanT + climate.seasonT * season + climate.dailyT * daily,
    climate.meanRh + climate.seasonRh * season + climate.dailyRh * daily,
  ];
}

/** Readings every `intervalMinutes` from `from` (inclusive) to `to` (exclusive), UTC days. */
export function* climateReadings(
  climate: Climate,
  from: string,
  to: string,
  intervalMinutes: number,
  rng: Random,
): Generator<Reading> {
  const end = Date.parse(`${to}T00:00:00Z`);
  for (let ms = Date.parse(`${from}T00:00:00Z`); ms < end; ms += intervalMinutes * 60_000) {
    const [t, rh] = at(climate, ms);
    yield {
      at: ms,
      day: new Date(ms).toISOString().slice(0, 10),
      temperatureC: Math.round((t + (rng.next() - 0.5) * 0.2) * 100) / 100,
      rh: Math.round((rh + (rng.next() - 0.5) * 1.0) * 10) / 10,
    };
  }
}

/** The climate's mean relative decay rate over a year, sampled hourly. */
export function yearlyRate(climate: Climate, year = 2026): number {
  let sum = 0;
  let n = 0;
  for (let ms = Date.UTC(year, 0, 1); ms < Date.UTC(year + 1, 0, 1); ms += 3_600_000) {
    const [t, rh] = at(climate, ms);
    sum += relativeDecayRate(t, rh);
    n += 1;
  }
  return sum / n;
}
