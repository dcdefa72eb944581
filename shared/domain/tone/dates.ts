const DAY_MS = 86_400_000;
/** The year of the trend slopes: 365.25 days (the definition). */
export const YEAR_DAYS = 365.25;

/** Midnight UTC of an ISO date, read by hand: re-evaluating every print calls this millions of times. */
const utc = (isoDate: string) =>
  Date.UTC(
    Number(isoDate.slice(0, 4)),
    Number(isoDate.slice(5, 7)) - 1,
    Number(isoDate.slice(8, 10)),
  );

/** Whole days from one ISO date to another (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return Math.round((utc(to) - utc(from)) / DAY_MS);
}

/** The ISO date `days` (rounded) after `from`. */
export function addDays(from: string, days: number): string {
  return new Date(utc(from) + Math.round(days) * DAY_MS).toISOString().slice(0, 10);
}

/** The ISO date `months` calendar months after `from`; the 31st becomes the month's last day. */
export function addMonths(from: string, months: number): string {
  const [year, month, day] = from.split('-').map(Number) as [number, number, number];
  const target = new Date(Date.UTC(year, month - 1 + months, 1));
  const lastDay = new Date(
    Date.UTC(target.getUTCFullYear(), target.getUTCMonth() + 1, 0),
  ).getUTCDate();
  target.setUTCDate(Math.min(day, lastDay));
  return target.toISOString().slice(0, 10);
}
