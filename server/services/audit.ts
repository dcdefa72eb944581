import type { Transaction } from 'sequelize';
import type { User } from '../models';
import { findAuditEvents, insertAuditEvent } from '../repositories/audit-repository';

export type AuditAction = 'create' | 'update' | 'delete' | 'restore';

/** Appends one audit event inside the caller's transaction, so it lands with the change. */
export async function recordAudit(
  entry: {
    user: User | null;
    action: AuditAction;
    entity: string;
    entityId: number;
    before?: unknown;
    after?: unknown;
  },
  transaction?: Transaction,
): Promise<void> {
  await insertAuditEvent(
    {
      at: new Date(),
      userId: entry.user?.id ?? null,
      action: entry.action,
      entity: entry.entity,
      entityId: entry.entityId,
      before: entry.before ?? null,
      after: entry.after ?? null,
    },
    transaction,
  );
}

/** The trail of changes, newest first, optionally for one record. */
export function listAuditEvents(filter: { entity?: string; entityId?: number; limit: number }) {
  return findAuditEvents(filter);
}
