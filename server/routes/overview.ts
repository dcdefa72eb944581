import { Router } from 'express';
import { OverviewQuerySchema, OverviewSeenSchema } from '../../shared/schemas/overview';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { validate } from '../middleware/validate';
import { markToneChangesSeen } from '../services/overview/mark-seen';
import { overviewFor } from '../services/overview/overview';

/**
 * `/api/overview`: the start page's summary for the asker's role (every signed-in role).
 * `POST /seen` (those who log tone checks): the tone status changes so far are marked seen,
 * so "changed since you last looked" starts again from now, whatever other sign-ins happen.
 */
export function overviewRouter(ctx: AppContext): Router {
  return Router()
    .post('/seen', requireAbility('tone:write'), validate(OverviewSeenSchema), async (req, res) => {
      await markToneChangesSeen(ctx.sequelize, currentUser(req));
      res.status(204).end();
    })
    .get(
      '/',
      requireAbility('catalogue:read'),
      validate(OverviewQuerySchema, 'query'),
      async (req, res) => {
        const user = currentUser(req);
        res.json(
          await overviewFor(
            { id: user.id, role: user.role, toneChangesSeenAt: user.toneChangesSeenAt },
            {
              sequelize: ctx.sequelize,
              uploadsDir: ctx.config.storage.kind === 'disk' ? ctx.config.uploadsDir : null,
            },
          ),
        );
      },
    );
}
