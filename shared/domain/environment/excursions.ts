import type { Reading } from './daily-summary';
import { bandBreach, type BandBreach, type StorageBand } from './storage-bands';

/** A stretch of readings outside the band, each reading breaking it the same way. */
export interface Excursion {
  breach: BandBreach;
  from: number;
  to: number;
  hours: number;
  readings: number;
  /** The furthest reading from the band: °C for too-warm, % RH otherwise. */
  worst: number;
}

/**
 * Stretches outside the band lasting at least `minHours` (first to last reading of the run).
 * A run ends at the first reading back inside, at a different breach, or at a pause longer
 * than `maxStepHours` (a logger gap is not evidence either way).
 */
export function excursions(
  readings: readonly Reading[],
  band: StorageBand,
  minHours: number,
  maxStepHours = 3,
): Excursion[] {
  const found: Excursion[] = [];
  const runs: { current: Excursion | null; last: number } = { current: null, last: 0 };
  const close = () => {
    if (runs.current && runs.current.hours >= minHours) found.push(runs.current);
    runs.current = null;
  };
  for (const r of readings) {
    const breach = bandBreach(band, r.temperatureC, r.rh);
    const gap = r.at - runs.last > maxStepHours * 3_600_000;
    if (runs.current && (breach !== runs.current.breach || gap)) close();
    runs.last = r.at;
    if (!breach) continue;
    const value: number = breach === 'too-warm' ? r.temperatureC : r.rh;
    const run = runs.current;
    if (!run) {
      runs.current = { breach, from: r.at, to: r.at, hours: 0, readings: 1, worst: value };
      continue;
    }
    run.to = r.at;
    run.hours = (r.at - run.from) / 3_600_000;
    run.readings += 1;
    run.worst = breach === 'too-dry' ? Math.min(run.worst, value) : Math.max(run.worst, value);
  }
  close();
  return found;
}
