import { describe, expect, it } from 'vitest';
import { daysInMonth, impossibleDateMessage } from '../../../shared/domain/calendar';

describe('the Gregorian calendar', () => {
  // Outside reference: ECMAScript's Date uses the proleptic Gregorian calendar (ECMA-262,
  // "Time Values and Time Range"); day 0 of the next month is the last day of this one.
  it('gives every month the length JavaScript’s Date gives it, 1000 to 2999', () => {
    for (let year = 1000; year <= 2999; year += 1) {
      for (let month = 1; month <= 12; month += 1) {
        const reference = new Date(Date.UTC(year, month, 0)).getUTCDate();
        if (daysInMonth(year, month) !== reference) {
          expect(daysInMonth(year, month), `${year}-${month}`).toBe(reference);
        }
      }
    }
  });
});

describe('a date shaped right that does not exist', () => {
  it('is named as not a date, with the length of its month', () => {
    for (const [text, message] of [
      ['2024-02-31', '2024-02-31 is not a date: February 2024 has 29 days.'],
      ['2026-02-30', '2026-02-30 is not a date: February 2026 has 28 days.'],
      [' 2023-04-31 ', '2023-04-31 is not a date: April 2023 has 30 days.'],
      ['1900-02-29', '1900-02-29 is not a date: February 1900 has 28 days.'],
      ['2024-13-01', '2024-13-01 is not a date: a year has months 01 to 12.'],
      ['2024-02-00', '2024-02-00 is not a date: the days of a month start at 01.'],
      ['2024-00', '2024-00 is not a date: a year has months 01 to 12.'],
    ]) {
      expect(impossibleDateMessage(text), text).toBe(message);
    }
  });

  it('says nothing of real dates or of text that is not a date at all', () => {
    for (const text of ['2024-02-29', '2000-02-29', '2026-12-31', '2026-05', 'someday', '2026']) {
      expect(impossibleDateMessage(text), text).toBeNull();
    }
    expect(impossibleDateMessage(undefined)).toBeNull();
  });
});
