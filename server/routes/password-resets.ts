import { Router, type Request } from 'express';
import { normaliseEmail } from '../../shared/domain/email';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import {
  PasswordResetRequestSchema,
  PasswordResetSchema,
  TokenParamsSchema,
} from '../../shared/schemas/people';
import type { AppContext } from '../context';
import { HttpProblem } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { linkOrigin } from '../services/people/link-origin';
import { requestPasswordReset, resetPassword } from '../services/people/password-resets';

/** `/api/password-resets`: forgotten passwords, open to anyone (contract). */
export function passwordResetsRouter(ctx: AppContext): Router {
  const router = Router();
  // Per client and address, and per address from every client together, whether or not it
  // is known (so the limit reveals nothing); keyed on the address as accounts are found.
  const limit = (max: number, key: (req: Request) => string) =>
    rateLimit({
      windowMs: 15 * 60 * 1000,
      limit: max,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      keyGenerator: key,
      handler: (_req, _res, next) =>
        next(new HttpProblem(429, 'Too many requests', 'Too many reset requests; wait and retry.')),
    });
  const perClient = limit(
    ctx.config.resetRequests,
    (req) => `${ipKeyGenerator(req.ip ?? '')}|${normaliseEmail(req.body?.email)}`,
  );
  const perAccount = limit(ctx.config.resetRequestsPerAccount, (req) =>
    normaliseEmail(req.body?.email),
  );

  router.post('/', perClient, perAccount, validate(PasswordResetRequestSchema), (req, res) => {
    requestPasswordReset(ctx, parsed<{ email: string }>(res).email, linkOrigin(ctx, req));
    res.status(202).json({
      detail: 'If this address has an account, a link to choose a new password is on its way.',
    });
  });

  router.post(
    '/:token',
    validate(TokenParamsSchema, 'params'),
    validate(PasswordResetSchema),
    async (_req, res) => {
      const { token } = parsed<{ token: string }>(res, 'params');
      await resetPassword(ctx, token, parsed<{ password: string }>(res).password);
      res.status(204).end();
    },
  );

  return router;
}
