/**
 * How numbers, counts, dates and sizes are written for people, in one place so every screen
 * says them the same way.
 */

/**
 * A number as en-GB writes it, by hand: no Intl formatter is built when the client starts
 * (each cost a few milliseconds on a slow phone, before the first page could draw). Digits
 * grouped by threes with a comma, at most three decimals rounded half away from zero, from
 * the shortest decimal that names the double (as ICU rounds), "-" for a negative, "∞" and
 * "NaN" as they are. tests/shared/domain/format.test.ts holds it to Intl.NumberFormat's output.
 */
function unsignedNumber(value: number): string {
  if (Number.isNaN(value)) return 'NaN';
  if (!Number.isFinite(value)) return '∞';
  // The shortest round-trip digits and their power of ten: "1.0005e+0" → 10005, 0.
  const [mantissa, power] = value.toExponential().split('e') as [string, string];
  const digits = mantissa.replace('.', '');
  const intLength = Number(power) + 1;
  let whole: string;
  let fraction: string;
  if (intLength <= 0) {
    whole = '0';
    fraction = '0'.repeat(-intLength) + digits;
  } else {
    whole = digits.slice(0, intLength).padEnd(intLength, '0');
    fraction = digits.slice(intLength);
  }
  if (fraction.length > 3) {
    const roundUp = fraction.charCodeAt(3) >= 53; // '5'
    fraction = fraction.slice(0, 3);
    if (roundUp) {
      const carried = increment(whole + fraction);
      whole = carried.slice(0, carried.length - 3);
      fraction = carried.slice(-3);
    }
  }
  fraction = fraction.replace(/0+$/, '');
  const grouped = whole.replace(/\B(?=(\d{3})+$)/g, ',');
  return fraction ? `${grouped}.${fraction}` : grouped;
}

/** A string of decimal digits plus one: "0999" → "1000", "999" → "1000". */
function increment(digits: string): string {
  const out = digits.split('');
  for (let i = out.length - 1; i >= 0; i -= 1) {
    if (out[i] !== '9') {
      out[i] = String(Number(out[i]) + 1);
      return out.join('');
    }
    out[i] = '0';
  }
  return `1${out.join('')}`;
}

const isNegative = (value: number) => value < 0 || Object.is(value, -0);

/** Plurals that are not the singular plus "s". */
const IRREGULAR: Record<string, string> = { batch: 'batches', patch: 'patches' };

/**
 * The noun in the number `count` calls for. English (CLDR) has "one" only for a count
 * written "1" (three decimals at most, as Intl.PluralRules reads it: 1.0001 is "1").
 */
export function nounFor(count: number, noun: string, plural?: string): string {
  if (unsignedNumber(Math.abs(count)) === '1') return noun;
  return plural ?? IRREGULAR[noun] ?? `${noun}s`;
}

/** "1 print", "100,000 prints": digits grouped, noun in the right number. */
export function formatCount(count: number, noun: string, plural?: string): string {
  return `${formatNumber(count)} ${nounFor(count, noun, plural)}`;
}

/** A number with its digits grouped: 100,000. */
export function formatNumber(value: number): string {
  const text = unsignedNumber(Math.abs(value));
  return isNegative(value) && text !== 'NaN' ? `-${text}` : text;
}

/** U+2212 MINUS SIGN: the typographic minus, not the hyphen (ISO 80000-1 prints "−"). */
export const MINUS = '\u2212';

/** A signed figure with a true minus sign and a plus for gains: "−0.42", "+1.3". */
export function formatSigned(value: number, digits: number): string {
  const text = Math.abs(value).toFixed(digits);
  if (Number(text) === 0) return text;
  return `${value < 0 ? MINUS : '+'}${text}`;
}

/** Any "-" that stands for minus before a digit becomes U+2212 (for text built elsewhere). */
export function withMinusSign(text: string): string {
  return text.replace(/(^|[\s(])-(?=\d)/g, `$1${MINUS}`);
}

const MONTHS = [
  'Jan',
  'Feb',
  'Mar',
  'Apr',
  'May',
  'Jun',
  'Jul',
  'Aug',
  'Sep',
  'Oct',
  'Nov',
  'Dec',
] as const;

/** The calendar date of an ISO date or timestamp: "14 May 2026" (its own day, in UTC for dates). */
function parts(value: string | Date): { year: number; month: number; day: number } | null {
  if (typeof value === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(value)) {
    const [year, month, day] = value.split('-').map(Number) as [number, number, number];
    return { year, month, day };
  }
  const date = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(date.getTime())) return null;
  return { year: date.getFullYear(), month: date.getMonth() + 1, day: date.getDate() };
}

/**
 * The one way dates are shown: "14 May 2026". `precise` adds the ISO date where the exact
 * day matters (an exhausted date, a check date): "14 May 2026 (2026-05-14)".
 */
export function formatDate(value: string | Date | null | undefined, precise = false): string {
  if (value === null || value === undefined || value === '') return '';
  const p = parts(value);
  if (!p) return String(value);
  const text = `${p.day} ${MONTHS[p.month - 1]} ${p.year}`;
  if (!precise) return text;
  const iso = `${p.year}-${String(p.month).padStart(2, '0')}-${String(p.day).padStart(2, '0')}`;
  return `${text} (${iso})`;
}

/** A date and time: "14 May 2026, 09:05". */
export function formatDateTime(value: string | Date | null | undefined): string {
  if (!value) return '';
  const date = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(date.getTime())) return String(value);
  const time = `${String(date.getHours()).padStart(2, '0')}:${String(date.getMinutes()).padStart(2, '0')}`;
  return `${formatDate(date)}, ${time}`;
}

/** Sizes are always width × height: "101.6 × 127 mm". */
export function formatSize(
  width: number | null | undefined,
  height: number | null | undefined,
  unit = 'mm',
): string | null {
  if (width == null && height == null) return null;
  const show = (value: number | null | undefined) => (value == null ? '?' : String(value));
  return `${show(width)} × ${show(height)} ${unit}`;
}

/**
 * A file's size for people: "36 KB" under a megabyte, "4.2 MB" above (1 KB = 1,024 bytes, as
 * file managers commonly count). A small scan must not read "0.0 MB".
 */
export function formatFileSize(bytes: number): string {
  if (bytes < 1024) return formatCount(bytes, 'byte');
  const kilobytes = Math.round(bytes / 1024);
  if (kilobytes < 1024) return `${formatNumber(kilobytes)} KB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}
