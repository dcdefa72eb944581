import type { Sequelize, Transaction } from 'sequelize';
import type { MovementReason } from '../../shared/domain/movements';
import type { Holding, Movement } from '../../shared/types/movement';
import { dialectOf } from '../db/dialect';
import { insertMany, runBound } from '../db/insert-many';
import { selectRows } from '../db/select-rows';

/** Ids per statement, within every database's bound-value limit. */
const CHUNK = 10_000;

const chunksOf = <T>(values: readonly T[]): T[][] => {
  const chunks: T[][] = [];
  for (let start = 0; start < values.length; start += CHUNK) {
    chunks.push(values.slice(start, start + CHUNK));
  }
  return chunks;
};

const slots = (count: number) => new Array<string>(count).fill('?').join(', ');

/** One movement to write. */
export interface NewMovement {
  printId: number;
  fromLocationId: number | null;
  toLocationId: number | null;
  movedOn: string;
  movedBy: number | null;
  reason: MovementReason;
  note: string | null;
}

const MOVEMENT_COLUMNS = [
  'print_id',
  'from_location_id',
  'to_location_id',
  'moved_on',
  'moved_by',
  'reason',
  'note',
  'created_at',
] as const;

/** Writes movements with multi-row INSERTs in the caller's transaction. */
export async function insertMovements(
  sequelize: Sequelize,
  movements: readonly NewMovement[],
  transaction: Transaction,
): Promise<void> {
  const now = dialectOf(sequelize).dateValue(new Date());
  await insertMany(
    sequelize,
    'movements',
    MOVEMENT_COLUMNS,
    movements.map((m) => [
      m.printId,
      m.fromLocationId,
      m.toLocationId,
      m.movedOn,
      m.movedBy,
      m.reason,
      m.note,
      now,
    ]),
    transaction,
  );
}

/**
 * "No later movement of the same print up to the date": the latest movement of a print on
 * a date is the one with the latest day, then the highest id (recorded last).
 */
const NO_LATER = `NOT EXISTS (
  SELECT 1 FROM movements later
  WHERE later.print_id = m.print_id AND later.moved_on <= ?
    AND (later.moved_on > m.moved_on OR (later.moved_on = m.moved_on AND later.id > m.id)))`;

/** Each print's place on a date (from its latest movement up to then); absent: none yet. */
export async function placesOn(
  sequelize: Sequelize,
  printIds: readonly number[],
  on: string,
  transaction: Transaction,
): Promise<Map<number, number | null>> {
  const places = new Map<number, number | null>();
  for (const chunk of chunksOf(printIds)) {
    const rows = await selectRows<{ print_id: number; to_location_id: number | null }>(
      sequelize,
      `SELECT m.print_id, m.to_location_id FROM movements m
       WHERE m.print_id IN (${slots(chunk.length)}) AND m.moved_on <= ? AND ${NO_LATER}`,
      [...chunk, on, on],
      transaction,
    );
    for (const row of rows) places.set(row.print_id, row.to_location_id);
  }
  return places;
}

/**
 * Sets each print's place to its latest movement's, the one rule for a print's place, and
 * marks it changed (`updated_at`).
 */
export async function settlePlaces(
  sequelize: Sequelize,
  printIds: readonly number[],
  transaction: Transaction,
): Promise<void> {
  const now = dialectOf(sequelize).dateValue(new Date());
  for (const chunk of chunksOf(printIds)) {
    await runBound(
      sequelize,
      `UPDATE prints SET location_id = (
         SELECT m.to_location_id FROM movements m WHERE m.print_id = prints.id
         ORDER BY m.moved_on DESC, m.id DESC LIMIT 1),
       updated_at = ?
       WHERE id IN (${slots(chunk.length)})`,
      [now, ...chunk],
      transaction,
    );
  }
}

/** Live prints among `ids`, with their current place. */
export async function livePrintPlaces(
  sequelize: Sequelize,
  ids: readonly number[],
  transaction: Transaction,
): Promise<Map<number, number | null>> {
  const found = new Map<number, number | null>();
  for (const chunk of chunksOf(ids)) {
    const rows = await selectRows<{ id: number; location_id: number | null }>(
      sequelize,
      `SELECT id, location_id FROM prints WHERE deleted_at IS NULL AND id IN (${slots(chunk.length)})`,
      chunk,
      transaction,
    );
    for (const row of rows) found.set(row.id, row.location_id);
  }
  return found;
}

interface MovementRow {
  id: number;
  print_id: number;
  moved_on: string;
  reason: MovementReason;
  note: string | null;
  from_id: number | null;
  from_code: string | null;
  from_name: string | null;
  to_id: number | null;
  to_code: string | null;
  to_name: string | null;
  by_id: number | null;
  by_name: string | null;
}

const placeOf = (id: number | null, code: string | null, name: string | null) =>
  id === null ? null : { id, code: code ?? '', name: name ?? '' };

/** A print's movements, latest first. */
export async function findMovementsOfPrint(
  sequelize: Sequelize,
  printId: number,
  transaction?: Transaction,
): Promise<Movement[]> {
  const rows = await selectRows<MovementRow>(
    sequelize,
    `SELECT m.id, m.print_id, m.moved_on, m.reason, m.note,
            f.id AS from_id, f.code AS from_code, f.name AS from_name,
            t.id AS to_id, t.code AS to_code, t.name AS to_name,
            u.id AS by_id, u.name AS by_name
     FROM movements m
     LEFT JOIN locations f ON f.id = m.from_location_id
     LEFT JOIN locations t ON t.id = m.to_location_id
     LEFT JOIN users u ON u.id = m.moved_by
     WHERE m.print_id = ?
     ORDER BY m.moved_on DESC, m.id DESC`,
    [printId],
    transaction,
  );
  return rows.map((row) => ({
    id: row.id,
    printId: row.print_id,
    from: placeOf(row.from_id, row.from_code, row.from_name),
    to: placeOf(row.to_id, row.to_code, row.to_name),
    movedOn: String(row.moved_on).slice(0, 10),
    movedBy: row.by_id === null ? null : { id: row.by_id, name: row.by_name ?? '' },
    reason: row.reason,
    note: row.note,
  }));
}

/** The live prints a place held at the end of a day: those whose latest movement went there. */
export async function findHoldingsOn(
  sequelize: Sequelize,
  locationId: number,
  on: string,
): Promise<Holding[]> {
  const rows = await selectRows<{
    id: number;
    accession_number: string;
    title: string;
    process: string;
    moved_on: string;
  }>(
    sequelize,
    `SELECT p.id, p.accession_number, p.title, p.process, m.moved_on
     FROM movements m JOIN prints p ON p.id = m.print_id
     WHERE m.to_location_id = ? AND m.moved_on <= ? AND p.deleted_at IS NULL AND ${NO_LATER}
     ORDER BY p.accession_number`,
    [locationId, on, on],
  );
  return rows.map((row) => ({
    id: row.id,
    accessionNumber: row.accession_number,
    title: row.title,
    process: row.process,
    since: String(row.moved_on).slice(0, 10),
  }));
}
