import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { buildPrintReport } from '../services/report/build-report';

/** `/api/prints/:id/report.pdf`: the printable condition and tone report. */
export function printReportRouter(ctx: AppContext): Router {
  return Router().get(
    '/:id/report.pdf',
    requireAbility('condition:read'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      const { pdf, accessionNumber } = await buildPrintReport(ctx, id, currentUser(req));
      res
        .type('application/pdf')
        .set(
          'Content-Disposition',
          `inline; filename="report-${accessionNumber.replace(/[^A-Za-z0-9.-]/g, '_')}.pdf"`,
        )
        .send(pdf);
    },
  );
}
