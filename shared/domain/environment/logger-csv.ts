import type { Reading } from './daily-summary';
import { createLocalClock } from './time-zone';

/** Which columns of a logger's export hold what; remembered per logger. */
export interface LoggerMapping {
  timestamp: string;
  temperature: string;
  humidity: string;
  /** Order of a date written with slashes or dots; ISO dates (2026-05-14) are always read. */
  dateOrder: 'ymd' | 'dmy' | 'mdy';
  temperatureUnit: 'C' | 'F';
}

/** Plausible readings of a store (common practice for sanity limits; ours). */
export const PLAUSIBLE = { minTemperatureC: -30, maxTemperatureC: 60, minRh: 1, maxRh: 100 };
/** A pause longer than this many logging intervals is reported as a gap. */
export const GAP_INTERVALS = 3;
export const MAX_ROWS = 300_000;
const MAX_LISTED = 50;

export interface ParsedLog {
  loggerId: string | null;
  columns: string[];
  mapping: LoggerMapping;
  readings: Reading[];
  rows: number;
  rejected: Array<{ row: number; reason: string }>;
  rejectedCount: number;
  duplicates: number;
  intervalMinutes: number | null;
  gaps: Array<{ from: string; to: string; minutes: number }>;
  gapCount: number;
}

export class LoggerFileError extends Error {}

const LOGGER_LINE =
  /^\s*"?(?:serial(?:\s*(?:number|no\.?))?|logger(?:\s*id)?|device)"?\s*[:;,=\t]\s*"?([\w.-]+)/i;
const NAME_GUESS = {
  timestamp: /date|time|stamp/i,
  temperature: /temp|°c|°f|\bc\b/i,
  humidity: /\brh\b|humid|%/i,
};

function delimiterOf(line: string): string {
  const counts = [',', ';', '\t'].map((d) => [d, line.split(d).length] as const);
  return counts.sort((a, b) => b[1] - a[1])[0]![0];
}

/** One CSV line split on the delimiter, with double-quoted cells. */
export function splitLine(line: string, delimiter: string): string[] {
  if (!line.includes('"')) return line.split(delimiter).map((cell) => cell.trim());
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < line.length; i += 1) {
    const c = line[i]!;
    if (quoted) {
      if (c === '"' && line[i + 1] === '"') {
        cell += '"';
        i += 1;
      } else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === delimiter) {
      cells.push(cell.trim());
      cell = '';
    } else cell += c;
  }
  cells.push(cell.trim());
  return cells;
}

const ISO =
  /^(\d{4})-(\d{2})-(\d{2})[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?\s*(Z|[+-]\d{2}:?\d{2})?$/;
const OTHER =
  /^(\d{1,4})[./](\d{1,2})[./](\d{1,4})[ ,T]+(\d{1,2}):(\d{2})(?::(\d{2}))?\s*(AM|PM)?$/i;

/** UTC ms of a logger timestamp, or null when it cannot be read. */
export function readTimestamp(
  text: string,
  order: LoggerMapping['dateOrder'],
  clock: ReturnType<typeof createLocalClock>,
): number | null {
  const iso = ISO.exec(text);
  if (iso) {
    const [y, mo, d, h, mi, s] = iso.slice(1, 7).map((v) => Number(v ?? 0)) as number[];
    if (!valid(y!, mo!, d!, h!, mi!, s!)) return null;
    const zone = iso[7];
    if (!zone) return clock.toUtc(y!, mo!, d!, h!, mi!, s!);
    const wall = Date.UTC(y!, mo! - 1, d!, h!, mi!, s!);
    if (zone === 'Z') return wall;
    const sign = zone.startsWith('-') ? -1 : 1;
    const digits = zone.replace(/[+:-]/g, '');
    return wall - sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2))) * 60_000;
  }
  const other = OTHER.exec(text);
  if (!other) return null;
  const [a, b, c] = [Number(other[1]), Number(other[2]), Number(other[3])];
  const [y, mo, d] = order === 'dmy' ? [c, b, a] : order === 'mdy' ? [c, a, b] : [a, b, c];
  let h = Number(other[4]);
  const meridiem = other[7]?.toUpperCase();
  if (meridiem === 'PM' && h < 12) h += 12;
  if (meridiem === 'AM' && h === 12) h = 0;
  const mi = Number(other[5]);
  const s = Number(other[6] ?? 0);
  const year = y < 100 ? 2000 + y : y;
  return valid(year, mo, d, h, mi, s) ? clock.toUtc(year, mo, d, h, mi, s) : null;
}

function valid(y: number, mo: number, d: number, h: number, mi: number, s: number): boolean {
  if (mo < 1 || mo > 12 || d < 1 || h > 23 || mi > 59 || s > 59) return false;
  return d <= new Date(Date.UTC(y, mo, 0)).getUTCDate();
}

function number(text: string, decimalComma: boolean): number {
  const cleaned = (decimalComma ? text.replace(',', '.') : text).replace(/[^\d.+-eE]/g, '');
  return cleaned === '' ? Number.NaN : Number(cleaned);
}

/** The logger's id from a preamble line ("Serial Number: 1043"), if the file names one. */
export function loggerIdOf(lines: readonly string[]): string | null {
  for (const line of lines) {
    const match = LOGGER_LINE.exec(line);
    if (match) return match[1]!;
  }
  return null;
}

/** The header line: the first naming the mapped columns, or guessable as time, °C and RH. */
function findHeader(
  lines: readonly string[],
  mapping: Partial<LoggerMapping> | null,
): { index: number; delimiter: string; columns: string[] } {
  for (let index = 0; index < Math.min(lines.length, 40); index += 1) {
    const line = lines[index]!;
    const delimiter = delimiterOf(line);
    const columns = splitLine(line, delimiter);
    if (columns.length < 3) continue;
    const named = mapping?.timestamp
      ? [mapping.timestamp, mapping.temperature, mapping.humidity].every((name) =>
          columns.includes(name ?? ''),
        )
      : Object.values(NAME_GUESS).every((re) => columns.some((c) => re.test(c)));
    if (named) return { index, delimiter, columns };
  }
  throw new LoggerFileError(
    mapping?.timestamp
      ? `No header line names the columns ${mapping.timestamp}, ${mapping.temperature} and ${mapping.humidity}.`
      : 'No header line with a time, a temperature and a humidity column was found; give the column names.',
  );
}

function guessMapping(
  columns: readonly string[],
  given: Partial<LoggerMapping> | null,
): LoggerMapping {
  const pick = (re: RegExp, taken: string[]) =>
    columns.find((c) => re.test(c) && !taken.includes(c)) ?? '';
  const timestamp = given?.timestamp ?? pick(NAME_GUESS.timestamp, []);
  const temperature = given?.temperature ?? pick(NAME_GUESS.temperature, [timestamp]);
  const humidity = given?.humidity ?? pick(NAME_GUESS.humidity, [timestamp, temperature]);
  return {
    timestamp,
    temperature,
    humidity,
    dateOrder: given?.dateOrder ?? 'ymd',
    temperatureUnit: given?.temperatureUnit ?? (/°?F\b|fahrenheit/i.test(temperature) ? 'F' : 'C'),
  };
}

const iso = (ms: number) => new Date(ms).toISOString();

/**
 * Reads a logger's CSV export: finds the header (after any preamble), maps the columns,
 * reads each row in the logger's time zone, refuses implausible or unreadable rows, drops
 * repeated timestamps (the first stays), and reports pauses longer than GAP_INTERVALS times
 * the usual interval. Readings come out in time order.
 */
export function parseLoggerCsv(
  text: string,
  options: { mapping: Partial<LoggerMapping> | null; timeZone: string },
): ParsedLog {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  const header = findHeader(lines, options.mapping);
  const mapping = guessMapping(header.columns, options.mapping);
  const col = {
    at: header.columns.indexOf(mapping.timestamp),
    t: header.columns.indexOf(mapping.temperature),
    rh: header.columns.indexOf(mapping.humidity),
  };
  if (col.at < 0 || col.t < 0 || col.rh < 0 || new Set(Object.values(col)).size < 3) {
    throw new LoggerFileError(
      'Name three different columns for the time, the temperature and the humidity.',
    );
  }
  const decimalComma = header.delimiter === ';';
  const clock = createLocalClock(options.timeZone);
  const rejected: ParsedLog['rejected'] = [];
  let rejectedCount = 0;
  const reject = (row: number, reason: string) => {
    rejectedCount += 1;
    if (rejected.length < MAX_LISTED) rejected.push({ row, reason });
  };
  const seen = new Set<number>();
  let duplicates = 0;
  let rows = 0;
  const readings: Reading[] = [];
  for (let index = header.index + 1; index < lines.length; index += 1) {
    const line = lines[index]!;
    if (line.trim() === '') continue;
    rows += 1;
    if (rows > MAX_ROWS) throw new LoggerFileError(`A file may hold at most ${MAX_ROWS} readings.`);
    const cells =
      header.delimiter === ',' && !line.includes('"')
        ? line.split(',')
        : splitLine(line, header.delimiter);
    const row = index + 1;
    const at = readTimestamp((cells[col.at] ?? '').trim(), mapping.dateOrder, clock);
    if (at === null) {
      reject(row, `The time "${cells[col.at] ?? ''}" cannot be read`);
      continue;
    }
    let t = number(cells[col.t] ?? '', decimalComma);
    if (mapping.temperatureUnit === 'F') t = ((t - 32) * 5) / 9;
    const rh = number(cells[col.rh] ?? '', decimalComma);
    if (!Number.isFinite(t) || t < PLAUSIBLE.minTemperatureC || t > PLAUSIBLE.maxTemperatureC) {
      reject(
        row,
        `Temperature "${cells[col.t] ?? ''}" is outside ${PLAUSIBLE.minTemperatureC} to ${PLAUSIBLE.maxTemperatureC} °C`,
      );
      continue;
    }
    if (!Number.isFinite(rh) || rh < PLAUSIBLE.minRh || rh > PLAUSIBLE.maxRh) {
      reject(
        row,
        `Humidity "${cells[col.rh] ?? ''}" is outside ${PLAUSIBLE.minRh} to ${PLAUSIBLE.maxRh} % RH`,
      );
      continue;
    }
    if (seen.has(at)) {
      duplicates += 1;
      continue;
    }
    seen.add(at);
    readings.push({ at, day: clock.dayOf(at), temperatureC: t, rh });
  }
  readings.sort((a, b) => a.at - b.at);
  const { intervalMinutes, gaps, gapCount } = findGaps(readings);
  return {
    loggerId: loggerIdOf(lines.slice(0, header.index)),
    columns: header.columns,
    mapping,
    readings,
    rows,
    rejected,
    rejectedCount,
    duplicates,
    intervalMinutes,
    gaps,
    gapCount,
  };
}

/** The usual logging interval (median step) and the pauses longer than GAP_INTERVALS of it. */
export function findGaps(
  readings: readonly Reading[],
): Pick<ParsedLog, 'intervalMinutes' | 'gaps' | 'gapCount'> {
  if (readings.length < 3) return { intervalMinutes: null, gaps: [], gapCount: 0 };
  const steps: number[] = [];
  for (let i = 1; i < readings.length; i += 1) steps.push(readings[i]!.at - readings[i - 1]!.at);
  const sorted = [...steps].sort((a, b) => a - b);
  const median = sorted[Math.floor(sorted.length / 2)]!;
  const gaps: ParsedLog['gaps'] = [];
  let gapCount = 0;
  steps.forEach((step, i) => {
    if (step <= GAP_INTERVALS * median) return;
    gapCount += 1;
    if (gaps.length < MAX_LISTED)
      gaps.push({
        from: iso(readings[i]!.at),
        to: iso(readings[i + 1]!.at),
        minutes: Math.round(step / 60_000),
      });
  });
  return { intervalMinutes: median / 60_000, gaps, gapCount };
}
