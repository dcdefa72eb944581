import type { Transaction } from 'sequelize';
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

/** Appends one audit event in the caller's transaction. */
export async function insertAuditEvent(row: AuditEventRow, transaction?: Transaction) {
  await AuditEvent.create(row, { transaction });
}

/** The newest audit events first, with the person who made each change. */
export function findAuditEvents(filter: { entity?: string; entityId?: number; limit: number }) {
  const { entity, entityId, limit } = filter;
  return AuditEvent.findAll({
    where: { ...(entity ? { entity } : {}), ...(entityId ? { entityId } : {}) },
    include: [{ model: User, as: 'user', attributes: ['id', 'email'] }],
    order: [['id', 'DESC']],
    limit,
  });
}
