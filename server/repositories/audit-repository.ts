import type { Sequelize, Transaction } from 'sequelize';
import { dialectOf } from '../db/dialect';
import { insertMany } from '../db/insert-many';
import { AuditEvent, User } from '../models';

/** One audit event as stored; `before`/`after` are the JSON snapshots. */
export interface AuditEventRow {
  at: Date;
  userId: number | null;
  action: string;
  entity: string;
  entityId: number;
  before: unknown;
  after: unknown;
}

/**
 * Appends one audit event in the caller's transaction, written as `insertAuditEvents`
 * writes many (one shape either way). Inside a write transaction it skips building a model
 * instance: every change writes one of these while holding the write lock.
 */
export async function insertAuditEvent(row: AuditEventRow, transaction?: Transaction) {
  if (transaction) await insertAuditEvents(AuditEvent.sequelize!, [row], transaction);
  else await AuditEvent.create(row);
}

/** The newest audit events first, with the person who made each change. */
export function findAuditEvents(filter: { entity?: string; entityId?: number; limit: number }) {
  const { entity, entityId, limit } = filter;
  return AuditEvent.findAll({
    where: { ...(entity ? { entity } : {}), ...(entityId ? { entityId } : {}) },
    include: [{ model: User, as: 'user', attributes: ['id', 'email', 'name'] }],
    order: [['id', 'DESC']],
    limit,
  });
}

/** Appends many audit events with multi-row INSERTs (a bulk move: one event per print). */
export async function insertAuditEvents(
  sequelize: Sequelize,
  rows: readonly AuditEventRow[],
  transaction: Transaction,
): Promise<void> {
  const at = (date: Date) => dialectOf(sequelize).dateValue(date);
  await insertMany(
    sequelize,
    'audit_events',
    ['at', 'user_id', 'action', 'entity', 'entity_id', 'before', 'after'],
    rows.map((row) => [
      at(row.at),
      row.userId,
      row.action,
      row.entity,
      row.entityId,
      row.before === null || row.before === undefined ? null : JSON.stringify(row.before),
      row.after === null || row.after === undefined ? null : JSON.stringify(row.after),
    ]),
    transaction,
  );
}
