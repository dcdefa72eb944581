import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import type { PrintingLogView, SolutionBatchDetail } from '../../shared/types/chemistry';
import { requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentNegative, presentSolutionBatch } from '../presenters/reference';
import { loadBatchDetail } from '../services/chemistry/batch-detail';
import { loadPrintingLog } from '../services/chemistry/printing-log';

/** `GET /api/solution-batches/:id`: a batch and the prints made with it. */
export function solutionBatchDetailRouter(): Router {
  return Router().get(
    '/:id',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      const { batch, ...detail } = await loadBatchDetail(parsed<{ id: number }>(res, 'params').id);
      const body: SolutionBatchDetail = { ...presentSolutionBatch(batch), ...detail };
      res.json(body);
    },
  );
}

/** `GET /api/negatives/:id/printing-log`: every print from a negative and a starting exposure. */
export function printingLogRouter(): Router {
  return Router().get(
    '/:id/printing-log',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    async (_req, res) => {
      const { negative, ...log } = await loadPrintingLog(parsed<{ id: number }>(res, 'params').id);
      const body: PrintingLogView = { negative: presentNegative(negative), ...log };
      res.json(body);
    },
  );
}
