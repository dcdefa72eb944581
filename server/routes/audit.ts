import { Router } from 'express';
import { AuditQuerySchema } from '../../shared/schemas/session';
import { requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentAuditEvent } from '../presenters/audit';
import { listAuditEvents } from '../services/audit';

type AuditQuery = { entity?: string; entityId?: number; limit: number };

/** `/api/audit`: the trail of changes, newest first. */
export function auditRouter(): Router {
  return Router().get(
    '/',
    requireAbility('audit:read'),
    validate(AuditQuerySchema, 'query'),
    async (_req, res) => {
      const events = await listAuditEvents(parsed<AuditQuery>(res, 'query'));
      res.json({ events: events.map(presentAuditEvent) });
    },
  );
}
