/**
 * Logger clocks keep local time. These turn a local wall-clock time in an IANA zone into
 * UTC and back to the local day, with the platform's time-zone data (Intl).
 */
const QUARTER_HOUR = 900_000;
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-CA', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/** Whether the platform knows the zone (`Europe/Berlin`, `UTC`). */
export function isTimeZone(value: string): boolean {
  try {
    formatter(value);
    return true;
  } catch {
    return false;
  }
}

function parts(ms: number, timeZone: string): number[] {
  const out: Record<string, number> = {};
  for (const part of formatter(timeZone).formatToParts(ms)) {
    if (part.type !== 'literal') out[part.type] = Number(part.value);
  }
  return [out.year!, out.month!, out.day!, out.hour!, out.minute!, out.second!];
}

/** Offset of the zone from UTC at an instant, in ms (local − UTC). */
export function zoneOffset(ms: number, timeZone: string): number {
  const [y, mo, d, h, mi, s] = parts(ms, timeZone);
  return Date.UTC(y!, mo! - 1, d!, h!, mi!, s!) - Math.floor(ms / 1000) * 1000;
}

/**
 * UTC ms of a local wall-clock time. In the hour a clock goes back the earlier instant is
 * taken; a time that does not exist (clock goes forward) is read with the offset before the
 * change. Offsets are cached per local hour: a year of readings asks Intl ~8,800 times.
 */
export function createLocalClock(timeZone: string): {
  toUtc: (y: number, mo: number, d: number, h: number, mi: number, s: number) => number;
  dayOf: (utcMs: number) => string;
} {
  const offsets = new Map<number, number>();
  const days = new Map<number, string>();
  const fixed = timeZone === 'UTC' || timeZone === 'Etc/UTC';
  return {
    toUtc(y, mo, d, h, mi, s) {
      const wall = Date.UTC(y, mo - 1, d, h, mi, s);
      if (fixed) return wall;
      const hourKey = Math.floor(wall / 3_600_000);
      let offset = offsets.get(hourKey);
      if (offset === undefined) {
        const guess = hourKey * 3_600_000;
        offset = zoneOffset(guess - zoneOffset(guess, timeZone), timeZone);
        offsets.set(hourKey, offset);
      }
      return wall - offset;
    },
    dayOf(utcMs) {
      // Per quarter hour: zones such as +05:45 change day off the hour.
      const key = Math.floor(utcMs / QUARTER_HOUR);
      let day = days.get(key);
      if (day === undefined) {
        const start = key * QUARTER_HOUR;
        day = new Date(fixed ? start : start + zoneOffset(start, timeZone))
          .toISOString()
          .slice(0, 10);
        days.set(key, day);
      }
      return day;
    },
  };
}
