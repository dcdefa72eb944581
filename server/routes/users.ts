import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  InvitationCreateSchema,
  UserUpdateSchema,
  type UserUpdateInput,
} from '../../shared/schemas/people';
import type { Role } from '../../shared/domain/roles';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import {
  inviteUser,
  listInvitations,
  resendInvitation,
  revokeInvitation,
} from '../services/people/invitations';
import { linkOrigin } from '../services/people/link-origin';
import { listUsers, updateUser } from '../services/people/users';

type Params = { id: number };

/** `/api/users`: people and their invitations (admin). */
export function usersRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAbility('users:manage'));

  router.get('/', async (_req, res) => {
    res.json({ items: await listUsers() });
  });

  router.get('/invitations', async (_req, res) => {
    res.json({ items: await listInvitations() });
  });

  router.post('/invitations', validate(InvitationCreateSchema), async (req, res) => {
    const caller = { ctx, user: currentUser(req), origin: linkOrigin(ctx, req) };
    res.status(201).json(await inviteUser(caller, parsed<{ email: string; role: Role }>(res)));
  });

  router.post('/invitations/:id/resend', validate(IdParamsSchema, 'params'), async (req, res) => {
    const caller = { ctx, user: currentUser(req), origin: linkOrigin(ctx, req) };
    res.json(await resendInvitation(caller, parsed<Params>(res, 'params').id));
  });

  router.delete('/invitations/:id', validate(IdParamsSchema, 'params'), async (req, res) => {
    await revokeInvitation(ctx, currentUser(req), parsed<Params>(res, 'params').id);
    res.status(204).end();
  });

  router.patch(
    '/:id',
    validate(IdParamsSchema, 'params'),
    validate(UserUpdateSchema),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      res.json(await updateUser(ctx, currentUser(req), id, parsed<UserUpdateInput>(res)));
    },
  );

  return router;
}
