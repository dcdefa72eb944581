import { Router, type NextFunction, type Request, type Response } from 'express';
import multer from 'multer';
import { roleCan } from '../../shared/domain/roles';
import { IdParamsSchema, queryBoolean } from '../../shared/schemas/common';
import {
  CheckRoundQuerySchema,
  CohortQuerySchema,
  ToneCheckCreateSchema,
  ToneCheckUpdateSchema,
  ToneWatchQuerySchema,
  type CheckRoundQuery,
  type CohortQuery,
  type ToneCheckCreate,
  type ToneCheckUpdate,
  type ToneWatchQuery,
} from '../../shared/schemas/tone';
import { z } from 'zod';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { problems } from '../middleware/problem';
import { multipartLimits, multipartProblem } from '../middleware/multipart';
import { parsed, validate } from '../middleware/validate';
import { acknowledgeAlert, listAlerts } from '../services/tone/alerts';
import { checkRound } from '../services/tone/check-round';
import { cohorts } from '../services/tone/cohorts';
import { importCgats } from '../services/tone/import-cgats';
import { listToneChecks, printToneTrend } from '../services/tone/read-tone';
import { createToneCheck, deleteToneCheck, updateToneCheck } from '../services/tone/tone-checks';
import { toneWatchPage } from '../services/tone/tone-watch-page';

type Params = { id: number };
const IMPORT_LIMIT_BYTES = 5 * 1024 * 1024;

/** Tone routes under `/api/prints/:id/…`: a print's checks and trend. */
export function printToneRouter(ctx: AppContext): Router {
  const router = Router();
  router.get(
    '/:id/tone-checks',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      res.json(await listToneChecks(parsed<Params>(res, 'params').id));
    },
  );
  router.post(
    '/:id/tone-checks',
    requireAbility('tone:write'),
    validate(IdParamsSchema, 'params'),
    validate(ToneCheckCreateSchema),
    async (req, res) => {
      const ctxUser = { sequelize: ctx.sequelize, user: currentUser(req) };
      const { id } = parsed<Params>(res, 'params');
      const check = await createToneCheck(ctxUser, id, parsed<ToneCheckCreate>(res));
      res.status(201).location(`/api/tone-checks/${check.id}`).json(check);
    },
  );
  router.get(
    '/:id/tone-trend',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      res.json(await printToneTrend(parsed<Params>(res, 'params').id));
    },
  );
  return router;
}

/** One uploaded file in memory; multer's own errors become problem details. */
function singleFile(req: Request, res: Response, next: NextFunction) {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: multipartLimits({ fileSize: IMPORT_LIMIT_BYTES, fields: 2, fieldSize: 1024 }),
  });
  upload.single('file')(req, res, (error: unknown) => {
    next(error ? multipartProblem(error, 'The file is larger than 5 MB.') : undefined);
  });
}

const ImportQuerySchema = z.object({ dryRun: queryBoolean.optional() });

/** `/api/tone-checks`: corrections, deletions and instrument imports. */
export function toneChecksRouter(ctx: AppContext): Router {
  const router = Router();
  router.post(
    '/import',
    requireAbility('tone:write'),
    validate(ImportQuerySchema, 'query'),
    singleFile,
    async (req, res) => {
      if (!req.file)
        throw problems.invalid([{ path: 'file', message: 'Attach a CGATS.17 file as "file"' }]);
      const { dryRun } = parsed<{ dryRun?: boolean }>(res, 'query');
      const result = await importCgats(
        { sequelize: ctx.sequelize, user: currentUser(req) },
        req.file.buffer.toString('utf8'),
        dryRun ?? false,
      );
      res.status(dryRun ? 200 : 201).json(result);
    },
  );
  router.patch(
    '/:id',
    requireAbility('tone:write'),
    validate(IdParamsSchema, 'params'),
    validate(ToneCheckUpdateSchema),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const ctxUser = { sequelize: ctx.sequelize, user: currentUser(req) };
      res.json(await updateToneCheck(ctxUser, id, parsed<ToneCheckUpdate>(res)));
    },
  );
  router.delete(
    '/:id',
    requireAbility('tone:write'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      await deleteToneCheck({ sequelize: ctx.sequelize, user: currentUser(req) }, id);
      res.status(204).end();
    },
  );
  return router;
}

/** `/api/tone-watch`: prints needing attention, most urgent first. */
export function toneWatchRouter(): Router {
  return Router().get(
    '/',
    requireAbility('tone:write'),
    validate(ToneWatchQuerySchema, 'query'),
    async (_req, res) => {
      const page = await toneWatchPage(parsed<ToneWatchQuery>(res, 'query'));
      res.type('json').set('ETag', page.etag).send(page.body);
    },
  );
}

/** `/api/tone-rounds`: prints due for a check in a period, by place in shelf order. */
export function toneRoundsRouter(): Router {
  return Router().get(
    '/',
    requireAbility('tone:write'),
    validate(CheckRoundQuerySchema, 'query'),
    async (_req, res) => {
      res.json(await checkRound(parsed<CheckRoundQuery>(res, 'query')));
    },
  );
}

/** `/api/alerts`: status changes and overdue checks, and their acknowledgement. */
export function alertsRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', requireAbility('tone:write'), async (_req, res) => {
    res.json({ items: await listAlerts() });
  });
  router.post(
    '/:id/acknowledgement',
    requireAbility('tone:write'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      res.json(await acknowledgeAlert(ctx.sequelize, id, currentUser(req)));
    },
  );
  return router;
}

/** `/api/cohorts`: tone-change rate by practice. */
export function cohortsRouter(ctx: AppContext): Router {
  return Router().get(
    '/',
    requireAbility('catalogue:read'),
    validate(CohortQuerySchema, 'query'),
    async (req, res) => {
      const { by } = parsed<CohortQuery>(res, 'query');
      // Grouping by place says where prints are kept: only for roles that may see places.
      if (by === 'place' && !roleCan(currentUser(req).role, 'locations:read')) {
        throw problems.forbidden('Places are not shown to your role.');
      }
      res.json({ by, groups: await cohorts(ctx.sequelize, by) });
    },
  );
}
