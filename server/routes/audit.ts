import { Router } from 'express';
import { AuditQuerySchema } from '../../shared/schemas/session';
import type { AuditEventView } from '../../shared/types/catalogue';
import { requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { AuditEvent, User } from '../models';

type AuditQuery = { entity?: string; entityId?: number; limit: number };

/** `/api/audit`: the trail of changes, newest first. */
export function auditRouter(): Router {
  return Router().get(
    '/',
    requireAbility('audit:read'),
    validate(AuditQuerySchema, 'query'),
    async (_req, res) => {
      const { entity, entityId, limit } = parsed<AuditQuery>(res, 'query');
      const events = await AuditEvent.findAll({
        where: { ...(entity ? { entity } : {}), ...(entityId ? { entityId } : {}) },
        include: [{ model: User, as: 'user', attributes: ['id', 'email'] }],
        order: [['id', 'DESC']],
        limit,
      });
      const views: AuditEventView[] = events.map((event) => ({
        at: event.at.toISOString(),
        user: event.user ? { id: event.user.id, email: event.user.email } : null,
        action: event.action,
        entity: event.entity,
        entityId: event.entityId,
        before: event.before,
        after: event.after,
      }));
      res.json({ events: views });
    },
  );
}
