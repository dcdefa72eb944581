import type { AuditEventView } from '../../shared/types/catalogue';
import type { AuditEvent } from '../models';

/** One audit event as `GET /api/audit` lists it. */
export function presentAuditEvent(event: AuditEvent): AuditEventView {
  return {
    at: event.at.toISOString(),
    user: event.user ? { id: event.user.id, email: event.user.email, name: event.user.name } : null,
    action: event.action,
    entity: event.entity,
    entityId: event.entityId,
    before: event.before,
    after: event.after,
  };
}
