import { Router } from 'express';
import { InvitationAcceptSchema, TokenParamsSchema } from '../../shared/schemas/people';
import type { InvitationPreview } from '../../shared/types/people';
import type { AppContext } from '../context';
import { parsed, validate } from '../middleware/validate';
import { acceptInvitation, findOpenInvitation } from '../services/people/invitations';

type Params = { token: string };

/** `/api/invitations/:token`: open to whoever holds the e-mailed link. */
export function invitationsRouter(ctx: AppContext): Router {
  const router = Router();

  router.get('/:token', validate(TokenParamsSchema, 'params'), async (_req, res) => {
    const invitation = await findOpenInvitation(parsed<Params>(res, 'params').token);
    const preview: InvitationPreview = {
      email: invitation.email,
      role: invitation.role,
      expiresAt: invitation.expiresAt.toISOString(),
    };
    res.json(preview);
  });

  router.post(
    '/:token',
    validate(TokenParamsSchema, 'params'),
    validate(InvitationAcceptSchema),
    async (_req, res) => {
      const { token } = parsed<Params>(res, 'params');
      const user = await acceptInvitation(ctx, token, parsed(res));
      res.status(201).json({ user });
    },
  );

  return router;
}
