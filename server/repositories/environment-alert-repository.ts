import type { Sequelize, Transaction } from 'sequelize';
import { dialectOf } from '../db/dialect';
import { insertMany, runBound } from '../db/insert-many';
import { selectRows } from '../db/select-rows';

/** Alerts for places outside their band (migration 0016). */

export interface EnvironmentAlertRow {
  id: number;
  location_id: number;
  code: string;
  name: string;
  kind: string;
  reason: string;
  started_at: string;
  ended_at: string;
  opened_at: string;
  acknowledged_at: string | null;
  acknowledged_by: number | null;
  acknowledged_email: string | null;
}

const SELECT = `SELECT a.id, a.location_id, l.code, l.name, a.kind, a.reason, a.started_at,
       a.ended_at, a.opened_at, a.acknowledged_at, a.acknowledged_by, u.email AS acknowledged_email
  FROM environment_alerts a JOIN locations l ON l.id = a.location_id
  LEFT JOIN users u ON u.id = a.acknowledged_by`;

/** Whether an alert of this kind already covers a stretch overlapping [from, to]. */
export async function overlappingAlertExists(
  sequelize: Sequelize,
  locationId: number,
  kind: string,
  from: Date,
  to: Date,
  transaction: Transaction,
): Promise<boolean> {
  const dialect = dialectOf(sequelize);
  const rows = await selectRows<{ id: number }>(
    sequelize,
    `SELECT id FROM environment_alerts
      WHERE location_id = ? AND kind = ? AND started_at <= ? AND ended_at >= ? LIMIT 1`,
    [locationId, kind, dialect.dateValue(to), dialect.dateValue(from)],
    transaction,
  );
  return rows.length > 0;
}

export function insertEnvironmentAlerts(
  sequelize: Sequelize,
  alerts: ReadonlyArray<{
    locationId: number;
    kind: string;
    reason: string;
    startedAt: Date;
    endedAt: Date;
  }>,
  transaction: Transaction,
): Promise<void> {
  if (alerts.length === 0) return Promise.resolve();
  const dialect = dialectOf(sequelize);
  const now = dialect.dateValue(new Date());
  return insertMany(
    sequelize,
    'environment_alerts',
    ['location_id', 'kind', 'reason', 'started_at', 'ended_at', 'opened_at'],
    alerts.map((a) => [
      a.locationId,
      a.kind,
      a.reason,
      dialect.dateValue(a.startedAt),
      dialect.dateValue(a.endedAt),
      now,
    ]),
    transaction,
  );
}

/** Alerts, unacknowledged first and newest first within each; optionally of some places or opened after a time. */
export function findEnvironmentAlerts(
  sequelize: Sequelize,
  filter: { locationIds?: readonly number[]; openedAfter?: Date; limit: number },
  transaction?: Transaction,
): Promise<EnvironmentAlertRow[]> {
  const where: string[] = [];
  const values: unknown[] = [];
  if (filter.locationIds) {
    if (filter.locationIds.length === 0) return Promise.resolve([]);
    where.push(`a.location_id IN (${filter.locationIds.map(() => '?').join(', ')})`);
    values.push(...filter.locationIds);
  }
  if (filter.openedAfter) {
    where.push('a.opened_at > ?');
    values.push(dialectOf(sequelize).dateValue(filter.openedAfter));
  }
  return selectRows<EnvironmentAlertRow>(
    sequelize,
    `${SELECT} ${where.length ? `WHERE ${where.join(' AND ')}` : ''}
      ORDER BY a.acknowledged_at IS NOT NULL, a.opened_at DESC, a.id DESC LIMIT ?`,
    [...values, filter.limit],
    transaction,
  );
}

export async function findEnvironmentAlert(
  sequelize: Sequelize,
  id: number,
  transaction?: Transaction,
): Promise<EnvironmentAlertRow | null> {
  const [row] = await selectRows<EnvironmentAlertRow>(
    sequelize,
    `${SELECT} WHERE a.id = ?`,
    [id],
    transaction,
  );
  return row ?? null;
}

export function acknowledgeEnvironmentAlertRow(
  sequelize: Sequelize,
  id: number,
  userId: number,
  transaction: Transaction,
): Promise<void> {
  return runBound(
    sequelize,
    'UPDATE environment_alerts SET acknowledged_at = ?, acknowledged_by = ? WHERE id = ? AND acknowledged_at IS NULL',
    [dialectOf(sequelize).dateValue(new Date()), userId, id],
    transaction,
  );
}
