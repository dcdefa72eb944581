import { Router } from 'express';
import {
  PasswordResetRequestSchema,
  PasswordResetSchema,
  TokenParamsSchema,
} from '../../shared/schemas/people';
import type { AppContext } from '../context';
import { addressLimits } from '../middleware/address-limits';
import { parsed, validate } from '../middleware/validate';
import { linkOrigin } from '../services/people/link-origin';
import { requestPasswordReset, resetPassword } from '../services/people/password-resets';

/** `/api/password-resets`: forgotten passwords, open to anyone (contract). */
export function passwordResetsRouter(ctx: AppContext): Router {
  const router = Router();
  // Counted whether or not the address is known, so the limit reveals nothing.
  const limits = addressLimits({
    perClient: ctx.config.resetRequests,
    perAccount: ctx.config.resetRequestsPerAccount,
    title: 'Too many requests',
    detail: 'Too many reset requests; wait and retry.',
  });

  router.post('/', ...limits, validate(PasswordResetRequestSchema), (req, res) => {
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
