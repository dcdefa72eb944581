import { Router, type NextFunction, type Request, type Response } from 'express';
import multer from 'multer';
import { roleCan } from '../../shared/domain/roles';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  EnvironmentQuerySchema,
  ReadingsQuerySchema,
  ReadingsUploadSchema,
  type EnvironmentQuery,
  type ReadingsUpload,
} from '../../shared/schemas/environment';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { multipartLimits, multipartProblem } from '../middleware/multipart';
import { problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { presentEnvironmentAlert, presentPlaceEnvironment } from '../presenters/environment';
import {
  acknowledgeEnvironmentAlert,
  listEnvironmentAlerts,
} from '../services/environment/environment-alerts';
import { importReadings } from '../services/environment/import-readings';
import { placeEnvironment } from '../services/environment/place-environment';

type Params = { id: number };
/** A year of 10-minute readings is about 2 MB; four years with long columns fit. */
const READINGS_LIMIT_BYTES = 32 * 1024 * 1024;

/** One logger file in memory, with the logger id, time zone and mapping as text fields. */
function loggerFile(req: Request, res: Response, next: NextFunction) {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: multipartLimits({ fileSize: READINGS_LIMIT_BYTES, fields: 3, fieldSize: 2048 }),
  });
  upload.single('file')(req, res, (error: unknown) => {
    if (error) return next(multipartProblem(error, 'Logger files of up to 32 MB are accepted.'));
    if (!req.file)
      return next(
        problems.invalid([{ path: 'file', message: 'Attach the logger’s CSV export as "file"' }]),
      );
    next();
  });
}

/** `/api/locations/:id/readings` and `/api/locations/:id/environment`. */
export function placeEnvironmentRouter(ctx: AppContext): Router {
  const router = Router();
  router.post(
    '/:id/readings',
    requireAbility('environment:write'),
    validate(IdParamsSchema, 'params'),
    validate(ReadingsQuerySchema, 'query'),
    loggerFile,
    validate(ReadingsUploadSchema),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const { dryRun } = parsed<{ dryRun?: boolean }>(res, 'query');
      const report = await importReadings(
        { sequelize: ctx.sequelize, user: currentUser(req) },
        id,
        req.file!.buffer.toString('utf8'),
        parsed<ReadingsUpload>(res),
        dryRun ?? false,
      );
      res.status(dryRun ? 200 : 201).json(report);
    },
  );
  router.get(
    '/:id/environment',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    validate(EnvironmentQuerySchema, 'query'),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const record = await placeEnvironment(
        ctx.sequelize,
        id,
        parsed<EnvironmentQuery>(res, 'query'),
      );
      const role = currentUser(req).role;
      res.json(
        presentPlaceEnvironment(record, {
          seePlaces: roleCan(role, 'locations:read'),
          seeAlerts: roleCan(role, 'environment:write'),
        }),
      );
    },
  );
  return router;
}

/** `/api/environment-alerts`: places outside their band, and their acknowledgement. */
export function environmentAlertsRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', requireAbility('environment:write'), async (_req, res) => {
    res.json({ items: (await listEnvironmentAlerts(ctx.sequelize)).map(presentEnvironmentAlert) });
  });
  router.post(
    '/:id/acknowledgement',
    requireAbility('environment:write'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const alert = await acknowledgeEnvironmentAlert(ctx.sequelize, id, currentUser(req));
      res.json(presentEnvironmentAlert(alert));
    },
  );
  return router;
}
