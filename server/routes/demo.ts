import { Router } from 'express';
import { DEMO_PASSWORD, DEMO_USERS } from '../../seeds/demo-reference';
import type { AppContext } from '../context';
import { hasActiveAccounts } from '../services/people/users';

/**
 * `/api/demo`: what the sign-in page may say about accounts. In demo mode, the demo
 * accounts; otherwise only whether any active account exists yet, so a fresh install can
 * say how to make the first admin.
 */
export function demoRouter(ctx: AppContext): Router {
  return Router().get('/', async (_req, res) => {
    if (!ctx.config.demo) {
      const firstRun = !(await hasActiveAccounts());
      return res.json({ demo: false, firstRun });
    }
    res.json({
      demo: true,
      password: DEMO_PASSWORD,
      accounts: DEMO_USERS.map(({ email, role }) => ({ email, role })),
    });
  });
}
