import type { Sequelize, Transaction } from 'sequelize';
import { notePrintsChanged, type PrintChangeKind } from '../../db/prints-changed';
import type { User } from '../../models';
import { auditSnapshot } from '../../presenters/print';
import { recordAudit, type AuditAction } from '../audit';
import type { loadPrint } from './load-print';
import type { PrintSearchIndex } from './search-index';

/** What every command on a print needs: the database, the search index, who acts. */
export interface PrintCommandContext {
  sequelize: Sequelize;
  searchIndex: PrintSearchIndex;
  user: User;
}

type Loaded = Awaited<ReturnType<typeof loadPrint>>;

/** The record as the audit trail keeps it. */
export const snapshotOf = (loaded: Loaded) => auditSnapshot(loaded.print, loaded.locationPath);

const CHANGE_OF: Record<AuditAction, PrintChangeKind> = {
  create: 'record',
  update: 'record',
  delete: 'deleted',
  restore: 'restored',
};

/**
 * One audit event for a print, inside the command's transaction; the print is noted as
 * changed, so the search index has it before the command answers.
 */
export function auditPrint(
  ctx: PrintCommandContext,
  action: AuditAction,
  entityId: number,
  states: { before?: unknown; after?: unknown },
  transaction: Transaction,
): Promise<void> {
  notePrintsChanged(transaction, [entityId], CHANGE_OF[action]);
  return recordAudit({ user: ctx.user, action, entity: 'print', entityId, ...states }, transaction);
}
