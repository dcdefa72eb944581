/** The year of the trend slopes: 365.25 days (the definition). */
export const YEAR_DAYS = 365.25;

/*
 * Dates are ISO `YYYY-MM-DD` text in the proleptic Gregorian calendar, read and written by
 * hand: re-evaluating every print calls these millions of times, and a `Date` per call (and
 * its `toISOString`) was a twentieth of a re-evaluation. `civilFromDays` is H. Hinnant's
 * "civil_from_days" and `daysOf` his "days_from_civil" (chrono-Compatible Low-Level Date Algorithms, 2013); the tests check
 * every function against JavaScript's own `Date` over centuries of days.
 */

/** Days since 1970-01-01 of an ISO date: Hinnant's "days_from_civil". */
function daysOf(isoDate: string): number {
  const month = Number(isoDate.slice(5, 7));
  const year = Number(isoDate.slice(0, 4)) - (month <= 2 ? 1 : 0);
  const day = Number(isoDate.slice(8, 10));
  const era = Math.floor(year / 400);
  const yearOfEra = year - era * 400;
  const dayOfYear = Math.floor((153 * (month > 2 ? month - 3 : month + 9) + 2) / 5) + day - 1;
  const dayOfEra =
    yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  return era * 146_097 + dayOfEra - 719_468;
}

const pad2 = (value: number) => (value < 10 ? `0${value}` : `${value}`);

/** `YYYY-MM-DD` of a year (1000–9999), month (1–12) and day. */
const isoOf = (year: number, month: number, day: number) => `${year}-${pad2(month)}-${pad2(day)}`;

/** The civil date of a count of days since 1970-01-01. */
function civilFromDays(days: number): string {
  const z = days + 719_468;
  const era = Math.floor(z / 146_097);
  const dayOfEra = z - era * 146_097;
  const yearOfEra = Math.floor(
    (dayOfEra -
      Math.floor(dayOfEra / 1460) +
      Math.floor(dayOfEra / 36_524) -
      Math.floor(dayOfEra / 146_096)) /
      365,
  );
  const dayOfYear =
    dayOfEra - (365 * yearOfEra + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100));
  const shiftedMonth = Math.floor((5 * dayOfYear + 2) / 153);
  const day = dayOfYear - Math.floor((153 * shiftedMonth + 2) / 5) + 1;
  const month = shiftedMonth < 10 ? shiftedMonth + 3 : shiftedMonth - 9;
  const year = yearOfEra + era * 400 + (month <= 2 ? 1 : 0);
  return isoOf(year, month, day);
}

const isLeap = (year: number) => (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** Days in a month (1–12) of a year. */
const daysInMonth = (year: number, month: number) =>
  month === 2 && isLeap(year) ? 29 : MONTH_DAYS[month - 1]!;

/** Whole days from one ISO date to another (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return daysOf(to) - daysOf(from);
}

/** The ISO date `days` (rounded) after `from`. */
export function addDays(from: string, days: number): string {
  return civilFromDays(daysOf(from) + Math.round(days));
}

/** The ISO date `months` calendar months after `from`; the 31st becomes the month's last day. */
export function addMonths(from: string, months: number): string {
  const year = Number(from.slice(0, 4));
  const month = Number(from.slice(5, 7));
  const day = Number(from.slice(8, 10));
  const index = year * 12 + (month - 1) + months;
  const targetYear = Math.floor(index / 12);
  const targetMonth = index - targetYear * 12 + 1;
  return isoOf(targetYear, targetMonth, Math.min(day, daysInMonth(targetYear, targetMonth)));
}
