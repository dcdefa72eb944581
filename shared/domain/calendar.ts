/**
 * The proleptic Gregorian calendar (ISO 8601): month lengths, and the plain words for a date
 * written in the right shape that does not exist ("2024-02-31"), so that people are told the
 * day is impossible instead of being shown the formats again.
 */

const MONTH_NAMES = [
  'January',
  'February',
  'March',
  'April',
  'May',
  'June',
  'July',
  'August',
  'September',
  'October',
  'November',
  'December',
] as const;

/** Leap years: every fourth year, except centuries not divisible by 400 (1900 is not, 2000 is). */
export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Days in a month (1–12) of a year. */
export function daysInMonth(year: number, month1: number): number {
  if (month1 === 2) return isLeapYear(year) ? 29 : 28;
  return [4, 6, 9, 11].includes(month1) ? 30 : 31;
}

const DAY_SHAPE = /^(\d{4})-(\d{2})-(\d{2})$/;
const MONTH_SHAPE = /^(\d{4})-(\d{2})$/;

/**
 * Why a `YYYY-MM-DD` (or `YYYY-MM`) text names no real day (or month), in words; null when it
 * is a real date or not in that shape at all (the caller's own message covers that).
 */
export function impossibleDateMessage(text: unknown): string | null {
  if (typeof text !== 'string') return null;
  const trimmed = text.trim();
  const match = trimmed.match(DAY_SHAPE) ?? trimmed.match(MONTH_SHAPE);
  if (!match) return null;
  const year = Number(match[1]);
  const month = Number(match[2]);
  if (month < 1 || month > 12) return `${trimmed} is not a date: a year has months 01 to 12.`;
  if (match[3] === undefined) return null;
  const day = Number(match[3]);
  const last = daysInMonth(year, month);
  if (day >= 1 && day <= last) return null;
  if (day < 1) return `${trimmed} is not a date: the days of a month start at 01.`;
  return `${trimmed} is not a date: ${MONTH_NAMES[month - 1]} ${year} has ${last} days.`;
}

/**
 * What a browser's own date field holds when its day, month and year make no date (31
 * February) or a part is left blank: it keeps no value and cannot say which, so neither do we.
 */
export const UNREADABLE_DATE_MESSAGE =
  'That date does not exist or is not finished: check the day against its month ' +
  '(February has 28 days, 29 in a leap year; April, June, September and November have 30).';
