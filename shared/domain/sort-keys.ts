/**
 * Keys that put things in the order people expect: numbers inside titles as numbers
 * ("print 2" before "print 10"), approximate dates by the middle of their range.
 */

/** Digit runs padded to one width, so plain string order is numeric order for them. */
export function naturalSortKey(text: string): string {
  return text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/\d+/g, (digits) => digits.replace(/^0+(?=\d)/, '').padStart(15, '0'));
}

/** Days since 1970-01-01 of a yyyymmdd number. */
function dayOf(yyyymmdd: number): number {
  const year = Math.floor(yyyymmdd / 10000);
  const month = Math.floor(yyyymmdd / 100) % 100;
  const day = yyyymmdd % 100;
  return Date.UTC(year, month - 1, day) / 86_400_000;
}

/**
 * Where a dated print sits in time: the middle day of its range ("c. 2022", 2020–2024, sits
 * in 2022; "2020" in mid-2020, before 2020-08-01). NaN when it has no date.
 */
export function dateRangeMiddle(from: number, to: number): number {
  if (!from) return Number.NaN;
  return (dayOf(from) + dayOf(to || from)) / 2;
}

/**
 * Plain code-unit order (what `<` does on strings), for keys that are not words people read
 * (query parameter names). `localeCompare` needs a collator, and building the first one took
 * tens of milliseconds on a slowed phone, paid on every list page's first load.
 */
export function byCodeUnits(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
