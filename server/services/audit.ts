import type { Transaction } from 'sequelize';
import { AuditEvent, type User } from '../models';

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
  await AuditEvent.create(
    {
      at: new Date(),
      userId: entry.user?.id ?? null,
      action: entry.action,
      entity: entry.entity,
      entityId: entry.entityId,
      before: entry.before ?? null,
      after: entry.after ?? null,
    },
    { transaction },
  );
}
