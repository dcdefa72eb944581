import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  LoanCreateSchema,
  LoanUpdateSchema,
  type LoanCreate,
  type LoanUpdate,
} from '../../shared/schemas/loan';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentLoan, presentLoanSummary } from '../presenters/loan';
import { buildLoanReport } from '../services/loans/loan-report';
import { printLight } from '../services/loans/light';
import { createLoan, listLoans, readLoan, updateLoan } from '../services/loans/loans';

type Params = { id: number };
const params = validate(IdParamsSchema, 'params');

/** `/api/loans`: loans and exhibitions (viewers read; curators plan; conservators sign). */
export function loansRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', requireAbility('catalogue:read'), async (_req, res) => {
    res.json({ items: (await listLoans(ctx.sequelize)).map(presentLoanSummary) });
  });
  router.post('/', requireAbility('loans:plan'), validate(LoanCreateSchema), async (req, res) => {
    const user = currentUser(req);
    const id = await createLoan({ ...ctx, user }, parsed<LoanCreate>(res));
    res
      .status(201)
      .location(`/api/loans/${id}`)
      .json(presentLoan(await readLoan(ctx.sequelize, id), user.role));
  });
  router.get('/:id/report.pdf', requireAbility('loans:plan'), params, async (_req, res) => {
    const { pdf, title } = await buildLoanReport(ctx, parsed<Params>(res, 'params').id);
    res
      .type('application/pdf')
      .set('Content-Disposition', `inline; filename="${title.replace(/[^A-Za-z0-9.-]/g, '_')}.pdf"`)
      .send(pdf);
  });
  router.get('/:id', requireAbility('catalogue:read'), params, async (req, res) => {
    const { id } = parsed<Params>(res, 'params');
    res.json(presentLoan(await readLoan(ctx.sequelize, id), currentUser(req).role));
  });
  router.patch(
    '/:id',
    requireAbility('loans:plan'),
    params,
    validate(LoanUpdateSchema),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const user = currentUser(req);
      await updateLoan({ ...ctx, user }, id, parsed<LoanUpdate>(res));
      res.json(presentLoan(await readLoan(ctx.sequelize, id), user.role));
    },
  );
  return router;
}

/** `GET /api/prints/:id/light`: lux hours per year and over the print's life. */
export function printLightRouter(ctx: AppContext): Router {
  return Router().get('/:id/light', requireAbility('catalogue:read'), params, async (_req, res) => {
    res.json(await printLight(ctx.sequelize, parsed<Params>(res, 'params').id));
  });
}
