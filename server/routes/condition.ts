import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  ConditionReportCreateSchema,
  ConditionReportUpdateSchema,
  TreatmentCreateSchema,
  type ConditionReportCreate,
  type ConditionReportUpdate,
  type TreatmentCreate,
} from '../../shared/schemas/condition';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentConditionReport, presentTreatment } from '../presenters/condition';
import {
  createConditionReport,
  deleteConditionReport,
  listConditionReports,
  updateConditionReport,
} from '../services/condition/condition-reports';
import { createTreatment, listTreatments } from '../services/condition/treatments';

type Params = { id: number };

/** `/api/prints/:id/condition-reports` and `/api/prints/:id/treatments`. */
export function conditionRouter(ctx: AppContext): Router {
  const router = Router({ mergeParams: true });
  const printId = (res: Parameters<typeof parsed>[0]) => parsed<Params>(res, 'params').id;

  router.get(
    '/:id/condition-reports',
    requireAbility('condition:read'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      const reports = await listConditionReports(printId(res));
      res.json({ items: reports.map(presentConditionReport) });
    },
  );

  router.post(
    '/:id/condition-reports',
    requireAbility('condition:write'),
    validate(IdParamsSchema, 'params'),
    validate(ConditionReportCreateSchema),
    async (req, res) => {
      const user = currentUser(req);
      const report = await createConditionReport(
        { ...ctx, user },
        printId(res),
        parsed<ConditionReportCreate>(res),
      );
      res.status(201).json(presentConditionReport(report));
    },
  );

  router.get(
    '/:id/treatments',
    requireAbility('condition:read'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      const treatments = await listTreatments(printId(res));
      res.json({ items: treatments.map(presentTreatment) });
    },
  );

  router.post(
    '/:id/treatments',
    requireAbility('condition:write'),
    validate(IdParamsSchema, 'params'),
    validate(TreatmentCreateSchema),
    async (req, res) => {
      const user = currentUser(req);
      const treatment = await createTreatment(
        { ...ctx, user },
        printId(res),
        parsed<TreatmentCreate>(res),
      );
      res.status(201).json(presentTreatment(treatment));
    },
  );

  return router;
}

/** `/api/condition-reports/:id`: corrections (audited) and removal. */
export function conditionReportsRouter(ctx: AppContext): Router {
  const router = Router();
  router.patch(
    '/:id',
    requireAbility('condition:write'),
    validate(IdParamsSchema, 'params'),
    validate(ConditionReportUpdateSchema),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const report = await updateConditionReport(
        { ...ctx, user: currentUser(req) },
        id,
        parsed<ConditionReportUpdate>(res),
      );
      res.json(presentConditionReport(report));
    },
  );
  router.delete(
    '/:id',
    requireAbility('condition:write'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      await deleteConditionReport({ ...ctx, user: currentUser(req) }, id);
      res.status(204).end();
    },
  );
  return router;
}
