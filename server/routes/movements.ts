import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  BulkMoveSchema,
  HoldingsQuerySchema,
  MovementCreateSchema,
  type BulkMove,
  type HoldingsQuery,
  type MovementCreate,
} from '../../shared/schemas/movement';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { bulkMove, holdingsOf, movementsOfPrint, movePrint } from '../services/movements/movements';

type Params = { id: number };
const params = validate(IdParamsSchema, 'params');

/** `/api/prints/:id/movements`: a print's places over time (curator+ read, archivist+ move). */
export function printMovementsRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/:id/movements', requireAbility('locations:read'), params, async (_req, res) => {
    const { id } = parsed<Params>(res, 'params');
    res.json({ items: await movementsOfPrint(ctx, id) });
  });
  router.post(
    '/:id/movements',
    requireAbility('prints:move'),
    params,
    validate(MovementCreateSchema),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const movement = await movePrint(
        { ...ctx, user: currentUser(req) },
        id,
        parsed<MovementCreate>(res),
      );
      res.status(201).location(`/api/prints/${id}/movements`).json(movement);
    },
  );
  return router;
}

/** `POST /api/movements`: many prints to one place in one step. */
export function bulkMovementsRouter(ctx: AppContext): Router {
  const router = Router();
  router.post('/', requireAbility('prints:move'), validate(BulkMoveSchema), async (req, res) => {
    const result = await bulkMove({ ...ctx, user: currentUser(req) }, parsed<BulkMove>(res));
    res.status(201).json(result);
  });
  return router;
}

/** `GET /api/locations/:id/holdings?on=`: what a place holds now or held on a day. */
export function placeHoldingsRouter(ctx: AppContext): Router {
  const router = Router();
  router.get(
    '/:id/holdings',
    requireAbility('locations:read'),
    params,
    validate(HoldingsQuerySchema, 'query'),
    async (_req, res) => {
      const { id } = parsed<Params>(res, 'params');
      res.json(await holdingsOf(ctx, id, parsed<HoldingsQuery>(res, 'query').on));
    },
  );
  return router;
}
