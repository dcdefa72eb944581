import { Router } from 'express';
import { OverviewQuerySchema } from '../../shared/schemas/overview';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { validate } from '../middleware/validate';
import { overviewFor } from '../services/overview/overview';

/** `/api/overview`: the start page's summary for the asker's role (every signed-in role). */
export function overviewRouter(ctx: AppContext): Router {
  return Router().get(
    '/',
    requireAbility('catalogue:read'),
    validate(OverviewQuerySchema, 'query'),
    async (req, res) => {
      const user = currentUser(req);
      res.json(
        await overviewFor(
          { id: user.id, role: user.role, previousSignInAt: user.previousSignInAt },
          {
            sequelize: ctx.sequelize,
            uploadsDir: ctx.config.storage.kind === 'disk' ? ctx.config.uploadsDir : null,
          },
        ),
      );
    },
  );
}
