import { Router } from 'express';
import { DEMO_PASSWORD, DEMO_USERS } from '../../seeds/demo-reference';
import type { AppContext } from '../context';

/** `/api/demo`: the demo accounts for the sign-in page, only while in demo mode. */
export function demoRouter(ctx: AppContext): Router {
  return Router().get('/', (_req, res) => {
    if (!ctx.config.demo) return res.json({ demo: false });
    res.json({
      demo: true,
      password: DEMO_PASSWORD,
      accounts: DEMO_USERS.map(({ email, role }) => ({ email, role })),
    });
  });
}
