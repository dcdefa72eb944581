import { describe, expect, it } from 'vitest';
import { addDays, addMonths, daysBetween } from '../../../../shared/domain/tone/dates';

/*
 * The reference is JavaScript's own Date (ECMA-262 §21.4.1: the proleptic Gregorian
 * calendar, days counted from 1970-01-01 UTC), computed the slow way.
 */
const DAY_MS = 86_400_000;
const isoOfTime = (ms: number) => new Date(ms).toISOString().slice(0, 10);
const timeOf = (iso: string) => Date.parse(`${iso}T00:00:00Z`);

function referenceAddMonths(from: string, months: number): string {
  const [year, month, day] = from.split('-').map(Number) as [number, number, number];
  const target = new Date(Date.UTC(year, month - 1 + months, 1));
  const lastDay = new Date(
    Date.UTC(target.getUTCFullYear(), target.getUTCMonth() + 1, 0),
  ).getUTCDate();
  target.setUTCDate(Math.min(day, lastDay));
  return target.toISOString().slice(0, 10);
}

describe('ISO date arithmetic by hand', () => {
  it('adds days as Date does, every day from 1899 to 2101 and across 400-year eras', () => {
    const start = timeOf('1899-12-25');
    for (let offset = 0; offset < 73_800; offset += 1) {
      const from = isoOfTime(start + offset * DAY_MS);
      for (const days of [0, 1, 59, 366, 36_524.6, -1, -400.4, 146_097]) {
        const expected = isoOfTime(timeOf(from) + Math.round(days) * DAY_MS);
        if (addDays(from, days) !== expected) {
          expect(addDays(from, days), `${from} + ${days}`).toBe(expected);
        }
      }
    }
  });

  it('adds months as Date does, month ends and leap years included', () => {
    const start = timeOf('1996-01-01');
    for (let offset = 0; offset < 12_000; offset += 1) {
      const from = isoOfTime(start + offset * DAY_MS);
      for (const months of [1, 3, 6, 12, 24, 59, -1, -13]) {
        const expected = referenceAddMonths(from, months);
        if (addMonths(from, months) !== expected) {
          expect(addMonths(from, months), `${from} + ${months} months`).toBe(expected);
        }
      }
    }
    // Worked by hand: 2024 is a leap year, 2100 is not, 2000 is.
    expect(addMonths('2024-01-31', 1)).toBe('2024-02-29');
    expect(addMonths('2100-01-31', 1)).toBe('2100-02-28');
    expect(addMonths('2000-01-31', 1)).toBe('2000-02-29');
    expect(addMonths('2024-12-15', 1)).toBe('2025-01-15');
  });

  it('counts whole days between dates as Date does', () => {
    const start = timeOf('1899-12-25');
    for (let offset = 0; offset < 73_800; offset += 7) {
      const from = isoOfTime(start + offset * DAY_MS);
      for (const days of [0, 1, 60, 365, 366, -1, -1461, 146_097]) {
        const to = isoOfTime(timeOf(from) + days * DAY_MS);
        if (daysBetween(from, to) !== days)
          expect(daysBetween(from, to), `${from} → ${to}`).toBe(days);
      }
    }
    expect(daysBetween('2024-02-28', '2024-03-01')).toBe(2);
    expect(daysBetween('2023-02-28', '2023-03-01')).toBe(1);
    expect(daysBetween('2026-03-01', '2017-03-01')).toBe(-3287);
  });
});
