import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  formatCount,
  formatDate,
  formatDateTime,
  formatFileSize,
  formatNumber,
  nounFor,
  formatSigned,
  formatSize,
  MINUS,
} from '../../../shared/domain/format';
import { byCodeUnits, dateRangeMiddle, naturalSortKey } from '../../../shared/domain/sort-keys';

describe('counts', () => {
  // Digit grouping with a comma every three digits (CLDR "en" number format).
  it('groups digits and puts the noun in the right number', () => {
    expect(formatCount(100_000, 'print')).toBe('100,000 prints');
    expect(formatCount(1, 'print')).toBe('1 print');
    expect(formatCount(0, 'file')).toBe('0 files');
    expect(formatCount(2, 'batch')).toBe('2 batches');
  });
});

describe('numbers written by hand, held to Intl', () => {
  // The outside reference: ECMA-402 Intl.NumberFormat('en-GB') and Intl.PluralRules('en')
  // (CLDR data, through ICU in V8). The client writes numbers without building either.
  const intl = new Intl.NumberFormat('en-GB');
  const plural = new Intl.PluralRules('en');

  it('writes what Intl.NumberFormat writes for edge values', () => {
    const values = [
      0,
      -0,
      1,
      -1,
      999,
      1000,
      1234567,
      1.0005,
      0.0005,
      0.0015,
      -0.0001,
      999.9995,
      0.9996,
      1e21,
      1.2345678901234566e25,
      1e-7,
      2.5e-7,
      Number.MAX_SAFE_INTEGER,
      Number.MAX_VALUE,
      Number.MIN_VALUE,
      NaN,
      Infinity,
      -Infinity,
      101.6,
      0.1 + 0.2,
    ];
    for (const value of values) expect(formatNumber(value), String(value)).toBe(intl.format(value));
  });

  it('writes what Intl.NumberFormat writes for any double and any integer', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.double(), fc.integer(), fc.double({ min: -1e4, max: 1e4 })),
        (value) => {
          expect(formatNumber(value)).toBe(intl.format(value));
        },
      ),
      { numRuns: 5000 },
    );
  });

  it('chooses singular or plural as Intl.PluralRules does', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.integer({ min: -3, max: 3 }), fc.double({ min: -3, max: 3, noNaN: true })),
        (count) => {
          const expected = plural.select(count) === 'one' ? 'print' : 'prints';
          expect(nounFor(count, 'print')).toBe(expected);
        },
      ),
      { numRuns: 5000 },
    );
    for (const count of [1, -1, 1.0001, 0.9999, 1.5, 0, 2]) {
      expect(nounFor(count, 'print'), String(count)).toBe(
        plural.select(count) === 'one' ? 'print' : 'prints',
      );
    }
  });
});

describe('signs, dates and sizes', () => {
  // ISO 80000-1 and Unicode: the minus sign is U+2212, not the hyphen-minus U+002D.
  it('writes minus as U+2212', () => {
    expect(formatSigned(-0.42, 2)).toBe(`${MINUS}0.42`);
    expect(MINUS.codePointAt(0)).toBe(0x2212);
    expect(formatSigned(1.3, 1)).toBe('+1.3');
    expect(formatSigned(-0.001, 2)).toBe('0.00');
  });

  it('writes one date format, with the ISO date where the day matters', () => {
    expect(formatDate('2026-05-14')).toBe('14 May 2026');
    expect(formatDate('2026-05-14', true)).toBe('14 May 2026 (2026-05-14)');
    expect(formatDate(null)).toBe('');
  });

  // The outside reference: ECMA-402 Intl.DateTimeFormat('en-GB', medium date, short time), as
  // the record's history wrote it before it moved to formatDateTime. One difference is kept on
  // purpose: CLDR's en-GB abbreviates September "Sept"; the app writes "Sep" in every date.
  it('writes a date and time as en-GB medium and short do', () => {
    const intl = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
    fc.assert(
      fc.property(
        fc.date({ min: new Date(1850, 0, 1), max: new Date(2100, 0, 1), noInvalidDate: true }),
        (date) => {
          expect(formatDateTime(date)).toBe(intl.format(date).replace('Sept', 'Sep'));
        },
      ),
    );
    expect(formatDateTime('2026-05-14T09:05:00')).toBe('14 May 2026, 09:05');
  });

  it('writes sizes width × height', () => {
    expect(formatSize(101.6, 127)).toBe('101.6 × 127 mm');
    expect(formatSize(null, null)).toBeNull();
  });
});

describe('sort keys', () => {
  // The outside reference: ECMA-262's default comparator of Array.prototype.sort (no
  // comparator given) orders strings by UTF-16 code units.
  it('orders parameter names as the default sort does, case by code unit', () => {
    fc.assert(
      fc.property(fc.array(fc.string()), (names) => {
        expect([...names].sort(byCodeUnits)).toEqual([...names].sort());
      }),
    );
    expect(['pageSize', 'Q', 'madeFrom', 'made'].sort(byCodeUnits)).toEqual([
      'Q',
      'made',
      'madeFrom',
      'pageSize',
    ]);
  });

  // Intl.Collator with numeric collation (ECMA-402) is the reference order.
  it('orders numbers within titles as Intl.Collator numeric does', () => {
    const titles = ['print 100', 'Print 10', 'print 2', 'print 1', 'Étude 3', 'etude 20'];
    const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });
    const byKey = [...titles].sort((a, b) =>
      naturalSortKey(a) < naturalSortKey(b) ? -1 : naturalSortKey(a) > naturalSortKey(b) ? 1 : 0,
    );
    expect(byKey).toEqual([...titles].sort(collator.compare));
  });

  // "c. 2022" is 2020-01-01 to 2024-12-31 (CIRCA_SPREAD_YEARS = 2): its middle is mid-2022.
  it('places an approximate date at the middle of its range', () => {
    const circa = dateRangeMiddle(20200101, 20241231);
    const year2020 = dateRangeMiddle(20200101, 20201231);
    const august = dateRangeMiddle(20200801, 20200801);
    expect(year2020).toBeLessThan(august);
    expect(august).toBeLessThan(circa);
    expect(Number.isNaN(dateRangeMiddle(0, 0))).toBe(true);
  });
});

// CLDR plural rules for English: "one" is exactly 1 (integer, no visible decimals); 0 and
// every other count take "other" (unicode.org CLDR language plural rules chart).
describe('formatCount and nounFor (the counts the tone area says)', () => {
  it('says "1 check" and "0 checks", "2 rows", "1 row"', () => {
    expect(formatCount(1, 'check')).toBe('1 check');
    expect(formatCount(0, 'check')).toBe('0 checks');
    expect(formatCount(2, 'row')).toBe('2 rows');
    expect(formatCount(1, 'row')).toBe('1 row');
  });

  it('knows the -es plurals the tone area uses', () => {
    expect(nounFor(3, 'patch')).toBe('patches');
    expect(nounFor(1, 'patch')).toBe('patch');
  });

  it('groups the digits of large counts', () => {
    expect(formatCount(1000, 'check')).toBe('1,000 checks');
    expect(formatCount(100000, 'patch')).toBe('100,000 patches');
  });
});

describe('file sizes', () => {
  // 1 KB = 1,024 bytes, as file managers commonly count.
  it('names a small file in kilobytes, not as 0.0 MB', () => {
    expect(formatFileSize(36_627)).toBe('36 KB');
    expect(formatFileSize(512)).toBe('512 bytes');
    expect(formatFileSize(1)).toBe('1 byte');
  });
  it('names a large file in megabytes with one decimal', () => {
    expect(formatFileSize(12.3 * 1024 * 1024)).toBe('12.3 MB');
    expect(formatFileSize(1024 * 1024 - 1)).toBe('1.0 MB');
  });
});
