/**
 * Dates of making are often approximate: "2019-05-14", "2019-05", "2019", "c. 2019",
 * "2017–2019", "2010s". Each is turned into an inclusive ISO range so that prints can be
 * filtered and sorted by when they were made.
 */
import { daysInMonth } from './calendar';

export interface DateRange {
  from: string;
  to: string;
}

/** Years either side of a "circa" year; chosen by us, shown in the help text. */
export const CIRCA_SPREAD_YEARS = 2;

const YEAR = String.raw`(\d{4})`;
const patterns: Array<[RegExp, (m: RegExpMatchArray) => DateRange | null]> = [
  [new RegExp(`^${YEAR}-(\\d{2})-(\\d{2})$`), (m) => day(m[1]!, m[2]!, m[3]!)],
  [new RegExp(`^${YEAR}-(\\d{2})$`), (m) => month(m[1]!, m[2]!)],
  [new RegExp(`^${YEAR}$`), (m) => years(+m[1]!, +m[1]!)],
  [
    new RegExp(`^(?:c\\.|ca\\.|circa|c)\\s*${YEAR}$`, 'i'),
    (m) => years(+m[1]! - CIRCA_SPREAD_YEARS, +m[1]! + CIRCA_SPREAD_YEARS),
  ],
  [new RegExp(`^${YEAR}\\s*[-–—/]\\s*${YEAR}$`), (m) => years(+m[1]!, +m[2]!)],
  [/^(\d{3})0s$/, (m) => years(+m[1]! * 10, +m[1]! * 10 + 9)],
];

/** The inclusive range a written date covers, or null when it cannot be read. */
export function parseApproximateDate(text: string): DateRange | null {
  const trimmed = text.trim();
  for (const [pattern, build] of patterns) {
    const match = trimmed.match(pattern);
    if (match) return build(match);
  }
  return null;
}

function years(first: number, last: number): DateRange | null {
  if (first > last || first < 1000 || last > 9999) return null;
  return { from: `${first}-01-01`, to: `${last}-12-31` };
}

function month(year: string, mm: string): DateRange | null {
  const m = Number(mm);
  if (m < 1 || m > 12) return null;
  return { from: `${year}-${mm}-01`, to: `${year}-${mm}-${pad(daysInMonth(+year, m))}` };
}

function day(year: string, mm: string, dd: string): DateRange | null {
  const m = Number(mm);
  const d = Number(dd);
  if (m < 1 || m > 12 || d < 1 || d > daysInMonth(+year, m)) return null;
  const iso = `${year}-${mm}-${dd}`;
  return { from: iso, to: iso };
}

function pad(n: number): string {
  return String(n).padStart(2, '0');
}
