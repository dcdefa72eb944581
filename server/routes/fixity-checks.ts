import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentFixityCheck } from '../presenters/fixity';
import {
  findFixityCheck,
  recentFixityChecks,
  runningFixityCheck,
  startFixityCheck,
} from '../services/fixity/run-fixity';

/** `/api/fixity-checks`: re-hash every original in the background (admin). */
export function fixityChecksRouter(ctx: AppContext): Router {
  const router = Router();
  const fixity = {
    sequelize: ctx.sequelize,
    storage: ctx.images.storage,
    background: ctx.background,
  };

  router.post('/', requireAbility('fixity:run'), async (req, res) => {
    const running = await runningFixityCheck();
    if (running) {
      return void res
        .status(202)
        .location(`/api/fixity-checks/${running.id}`)
        .json({ id: running.id });
    }
    const check = await startFixityCheck(fixity, currentUser(req).id);
    await ctx.jobs.send('fixity-check', { checkId: check.id });
    res.status(202).location(`/api/fixity-checks/${check.id}`).json({ id: check.id });
  });

  router.get('/', requireAbility('fixity:run'), async (_req, res) => {
    const items = await recentFixityChecks();
    res.json({ items: items.map(presentFixityCheck) });
  });

  router.get(
    '/:id',
    requireAbility('fixity:run'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      const check = await findFixityCheck(parsed<{ id: number }>(res, 'params').id);
      res.json(presentFixityCheck(check));
    },
  );

  return router;
}
