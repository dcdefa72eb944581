import type { Sequelize, Transaction } from 'sequelize';
import type { DaySummary, Reading } from '../../shared/domain/environment/daily-summary';
import type { LoggerMapping } from '../../shared/domain/environment/logger-csv';
import { dialectOf } from '../db/dialect';
import { insertMany, runBound } from '../db/insert-many';
import { selectRows } from '../db/select-rows';

/** The storage environment's tables (migration 0016): readings, day summaries, loggers, alerts. */

const slots = (n: number) => Array.from({ length: n }, () => '?').join(', ');
/** Local days reach at most 14 h either side of their UTC day (UTC−12 to UTC+14). */
const ZONE_MARGIN_MS = 14 * 3_600_000;

export interface PlaceRow {
  id: number;
  code: string;
  name: string;
  parent_id: number | null;
}

export function findAllPlaces(
  sequelize: Sequelize,
  transaction?: Transaction,
): Promise<PlaceRow[]> {
  return selectRows<PlaceRow>(
    sequelize,
    'SELECT id, code, name, parent_id FROM locations',
    [],
    transaction,
  );
}

export interface LoggerRow {
  id: number;
  logger_key: string;
  mapping: string;
  time_zone: string;
}

export async function findLogger(
  sequelize: Sequelize,
  key: string,
  transaction?: Transaction,
): Promise<{ id: number; mapping: LoggerMapping; timeZone: string } | null> {
  const [row] = await selectRows<LoggerRow>(
    sequelize,
    'SELECT id, logger_key, mapping, time_zone FROM environment_loggers WHERE logger_key = ?',
    [key],
    transaction,
  );
  if (!row) return null;
  const mapping =
    typeof row.mapping === 'string' ? (JSON.parse(row.mapping) as LoggerMapping) : row.mapping;
  return { id: row.id, mapping, timeZone: row.time_zone };
}

/** Remembers a logger's mapping and zone; returns its id. */
export async function saveLogger(
  sequelize: Sequelize,
  logger: { key: string; mapping: LoggerMapping; timeZone: string; locationId: number },
  transaction: Transaction,
): Promise<number> {
  const now = dialectOf(sequelize).dateValue(new Date());
  const existing = await findLogger(sequelize, logger.key, transaction);
  const mapping = JSON.stringify(logger.mapping);
  if (existing) {
    await runBound(
      sequelize,
      'UPDATE environment_loggers SET mapping = ?, time_zone = ?, location_id = ?, updated_at = ? WHERE id = ?',
      [mapping, logger.timeZone, logger.locationId, now, existing.id],
      transaction,
    );
    return existing.id;
  }
  await insertMany(
    sequelize,
    'environment_loggers',
    ['logger_key', 'mapping', 'time_zone', 'location_id', 'updated_at'],
    [[logger.key, mapping, logger.timeZone, logger.locationId, now]],
    transaction,
  );
  return (await findLogger(sequelize, logger.key, transaction))!.id;
}

/** Times (ms) already stored for a place between two instants, inclusive. */
export async function storedTimes(
  sequelize: Sequelize,
  locationId: number,
  fromMs: number,
  toMs: number,
  transaction?: Transaction,
): Promise<Set<number>> {
  const rows = await selectRows<{ at: number }>(
    sequelize,
    'SELECT at FROM environment_readings WHERE location_id = ? AND at >= ? AND at <= ?',
    [locationId, fromMs, toMs],
    transaction,
  );
  return new Set(rows.map((row) => Number(row.at)));
}

export function insertReadings(
  sequelize: Sequelize,
  locationId: number,
  loggerId: number | null,
  readings: readonly Reading[],
  transaction: Transaction,
): Promise<void> {
  return insertMany(
    sequelize,
    'environment_readings',
    ['location_id', 'at', 'day', 'temperature_c', 'rh', 'logger_id'],
    readings.map((r) => [locationId, r.at, r.day, r.temperatureC, r.rh, loggerId]),
    transaction,
  );
}

/** Which of these days already have a summary for the place. */
export async function daysWithSummary(
  sequelize: Sequelize,
  locationId: number,
  days: readonly string[],
  transaction?: Transaction,
): Promise<Set<string>> {
  const found = new Set<string>();
  for (let start = 0; start < days.length; start += 500) {
    const chunk = days.slice(start, start + 500);
    const rows = await selectRows<{ day: string }>(
      sequelize,
      `SELECT day FROM environment_days WHERE location_id = ? AND day IN (${slots(chunk.length)})`,
      [locationId, ...chunk],
      transaction,
    );
    for (const row of rows) found.add(row.day);
  }
  return found;
}

interface ReadingRow {
  at: number;
  day: string;
  temperature_c: number;
  rh: number;
}

const toReading = (row: ReadingRow): Reading => ({
  at: Number(row.at),
  day: row.day,
  temperatureC: row.temperature_c,
  rh: row.rh,
});

/** Every stored reading of one local day of a place. */
export async function readingsOfDay(
  sequelize: Sequelize,
  locationId: number,
  day: string,
  transaction?: Transaction,
): Promise<Reading[]> {
  const start = Date.parse(`${day}T00:00:00Z`);
  const rows = await selectRows<ReadingRow>(
    sequelize,
    `SELECT at, day, temperature_c, rh FROM environment_readings
      WHERE location_id = ? AND at >= ? AND at < ? AND day = ?`,
    [locationId, start - ZONE_MARGIN_MS, start + 86_400_000 + ZONE_MARGIN_MS, day],
    transaction,
  );
  return rows.map(toReading);
}

/** Stored readings of a place whose local day lies in [from, to], oldest first, at most `limit`. */
export async function readingsBetween(
  sequelize: Sequelize,
  locationId: number,
  from: string,
  to: string,
  limit: number,
): Promise<Reading[]> {
  const start = Date.parse(`${from}T00:00:00Z`) - ZONE_MARGIN_MS;
  const end = Date.parse(`${to}T00:00:00Z`) + 86_400_000 + ZONE_MARGIN_MS;
  const rows = await selectRows<ReadingRow>(
    sequelize,
    `SELECT at, day, temperature_c, rh FROM environment_readings
      WHERE location_id = ? AND at >= ? AND at < ? AND day >= ? AND day <= ?
      ORDER BY at LIMIT ?`,
    [locationId, start, end, from, to, limit],
  );
  return rows.map(toReading);
}

const DAY_COLUMNS = [
  'location_id',
  'day',
  'readings',
  't_min',
  't_max',
  't_sum',
  'rh_min',
  'rh_max',
  'rh_sum',
  'rate_sum',
] as const;

/** Puts the summaries of these days in place of any stored for them. */
export async function replaceDays(
  sequelize: Sequelize,
  locationId: number,
  summaries: readonly DaySummary[],
  transaction: Transaction,
): Promise<void> {
  for (let start = 0; start < summaries.length; start += 500) {
    const chunk = summaries.slice(start, start + 500);
    await runBound(
      sequelize,
      `DELETE FROM environment_days WHERE location_id = ? AND day IN (${slots(chunk.length)})`,
      [locationId, ...chunk.map((s) => s.day)],
      transaction,
    );
  }
  await insertMany(
    sequelize,
    'environment_days',
    DAY_COLUMNS,
    summaries.map((s) => [
      locationId,
      s.day,
      s.readings,
      s.tMin,
      s.tMax,
      s.tSum,
      s.rhMin,
      s.rhMax,
      s.rhSum,
      s.rateSum,
    ]),
    transaction,
  );
}

interface DayRow {
  day: string;
  readings: number;
  t_min: number;
  t_max: number;
  t_sum: number;
  rh_min: number;
  rh_max: number;
  rh_sum: number;
  rate_sum: number;
}

/** Day summaries of a place in [from, to], oldest first. */
export async function findDays(
  sequelize: Sequelize,
  locationId: number,
  from: string,
  to: string,
): Promise<DaySummary[]> {
  const rows = await selectRows<DayRow>(
    sequelize,
    `SELECT day, readings, t_min, t_max, t_sum, rh_min, rh_max, rh_sum, rate_sum
       FROM environment_days WHERE location_id = ? AND day >= ? AND day <= ? ORDER BY day`,
    [locationId, from, to],
  );
  return rows.map((r) => ({
    day: r.day,
    readings: Number(r.readings),
    tMin: r.t_min,
    tMax: r.t_max,
    tSum: r.t_sum,
    rhMin: r.rh_min,
    rhMax: r.rh_max,
    rhSum: r.rh_sum,
    rateSum: r.rate_sum,
  }));
}

/** The latest summarised day of each of these places that has any. */
export async function latestDays(
  sequelize: Sequelize,
  locationIds: readonly number[],
): Promise<Map<number, string>> {
  if (locationIds.length === 0) return new Map();
  const rows = await selectRows<{ location_id: number; day: string }>(
    sequelize,
    `SELECT location_id, MAX(day) AS day FROM environment_days
      WHERE location_id IN (${slots(locationIds.length)}) GROUP BY location_id`,
    [...locationIds],
  );
  return new Map(rows.map((row) => [Number(row.location_id), row.day]));
}

export interface PrintAtPlace {
  id: number;
  accession_number: string;
  title: string;
  process: string;
  tone_status: string;
  tone_rate_per_year: number | null;
  location_id: number;
}

/** Live prints kept at any of these places. */
export function printsAt(
  sequelize: Sequelize,
  locationIds: readonly number[],
  transaction?: Transaction,
): Promise<PrintAtPlace[]> {
  if (locationIds.length === 0) return Promise.resolve([]);
  return selectRows<PrintAtPlace>(
    sequelize,
    `SELECT id, accession_number, title, process, tone_status, tone_rate_per_year, location_id
       FROM prints WHERE deleted_at IS NULL AND location_id IN (${slots(locationIds.length)})
      ORDER BY accession_number`,
    [...locationIds],
    transaction,
  );
}
