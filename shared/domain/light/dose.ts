/**
 * Light dose: the exposure a print receives on display is illuminance × time, in lux hours
 * (lx·h). A display period counts every day from its first to its last inclusive at its
 * agreed maximum illuminance for its opening hours (until measured values exist), so the
 * figure is an upper bound.
 */

/** A time on display at one illuminance. */
export interface DisplayPeriod {
  startsOn: string;
  endsOn: string;
  lux: number;
  hoursPerDay: number;
}

const DAY_MS = 86_400_000;
const dayNumber = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / DAY_MS;

/** Days from `startsOn` to `endsOn`, both counted (a one-day show is 1 day). */
export function daysInclusive(startsOn: string, endsOn: string): number {
  return Math.max(0, dayNumber(endsOn) - dayNumber(startsOn) + 1);
}

/** Exposure in lux hours: illuminance × hours open a day × days. */
export function luxHours(lux: number, hoursPerDay: number, days: number): number {
  return lux * hoursPerDay * days;
}

/** A period's exposure split by calendar year (a show over New Year counts in both). */
export function periodDoseByYear(period: DisplayPeriod): Map<number, number> {
  const byYear = new Map<number, number>();
  const first = Number(period.startsOn.slice(0, 4));
  const last = Number(period.endsOn.slice(0, 4));
  for (let year = first; year <= last; year++) {
    const from = year === first ? period.startsOn : `${year}-01-01`;
    const to = year === last ? period.endsOn : `${year}-12-31`;
    const days = daysInclusive(from, to);
    if (days > 0) byYear.set(year, luxHours(period.lux, period.hoursPerDay, days));
  }
  return byYear;
}

/** Several periods' exposure by year, summed. */
export function doseByYear(periods: readonly DisplayPeriod[]): Map<number, number> {
  const total = new Map<number, number>();
  for (const period of periods) {
    for (const [year, dose] of periodDoseByYear(period)) {
      total.set(year, (total.get(year) ?? 0) + dose);
    }
  }
  return total;
}

/** A print's light history: lifetime total and each year's, oldest first, with the limit. */
export function lightHistory(
  periods: readonly DisplayPeriod[],
  annualLimit: number,
): { lifetimeLuxHours: number; years: Array<{ year: number; luxHours: number; limit: number }> } {
  const byYear = doseByYear(periods);
  const years = [...byYear.entries()]
    .sort(([a], [b]) => a - b)
    .map(([year, dose]) => ({ year, luxHours: dose, limit: annualLimit }));
  return { lifetimeLuxHours: years.reduce((sum, year) => sum + year.luxHours, 0), years };
}

/** One year in which a planned display would take a print past its annual limit. */
export interface LimitExcess {
  year: number;
  alreadyLuxHours: number;
  plannedLuxHours: number;
  limit: number;
  /** How far past the limit the year would end (lx·h). */
  overBy: number;
}

/** The years in which what a print already has plus the planned period passes the limit. */
export function excessOverLimit(
  already: readonly DisplayPeriod[],
  planned: DisplayPeriod,
  annualLimit: number,
): LimitExcess[] {
  const before = doseByYear(already);
  const excess: LimitExcess[] = [];
  for (const [year, added] of periodDoseByYear(planned)) {
    const alreadyLuxHours = before.get(year) ?? 0;
    const overBy = alreadyLuxHours + added - annualLimit;
    if (overBy > 0) {
      excess.push({ year, alreadyLuxHours, plannedLuxHours: added, limit: annualLimit, overBy });
    }
  }
  return excess;
}
