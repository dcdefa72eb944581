import type { NextFunction, Request, Response } from 'express';
import { Router } from 'express';
import { isDemoEmail } from '../auth/demo-accounts';
import type { PassportInstance } from '../auth/passport';
import { abilitiesOf } from '../../shared/domain/roles';
import { SignInSchema } from '../../shared/schemas/session';
import { PasswordChangeSchema, type PasswordChangeInput } from '../../shared/schemas/people';
import { changeOwnPassword, recordSignIn } from '../services/people/users';
import type { SessionResponse } from '../../shared/types/catalogue';
import type { AppContext } from '../context';
import { addressLimits } from '../middleware/address-limits';
import { currentUser, requireSignIn, type SignedInUser } from '../middleware/authorize';
import { csrfTokenOf } from '../middleware/csrf';
import { HttpProblem } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';

function sessionBody(req: Request, user: SignedInUser, demo: boolean): SessionResponse {
  return {
    user: { id: user.id, email: user.email, name: user.name, role: user.role },
    csrfToken: csrfTokenOf(req),
    abilities: abilitiesOf(user.role),
    demo,
  };
}

/** Sign in, who am I, sign out. */
export function sessionRouter(ctx: AppContext, passport: PassportInstance): Router {
  const router = Router();
  // Only failures count.
  const limits = addressLimits({
    perClient: ctx.config.signInAttempts,
    perAccount: ctx.config.signInAttemptsPerAccount,
    failuresOnly: true,
    title: 'Too many attempts',
    detail: 'Too many failed sign-ins; wait and retry.',
  });

  router.post('/', ...limits, validate(SignInSchema), (req, res, next: NextFunction) => {
    // The demo's published password must open nothing once the demo is off.
    if (!ctx.config.demo && isDemoEmail(String(req.body.email)))
      return next(new HttpProblem(401, 'Not signed in', 'Wrong e-mail or password.'));
    passport.authenticate('local', (error: unknown, user: SignedInUser | false) => {
      if (error) return next(error);
      if (!user) return next(new HttpProblem(401, 'Not signed in', 'Wrong e-mail or password.'));
      // passport regenerates the session id here, so a planted id is worth nothing.
      req.logIn(user, (loginError) => {
        if (loginError) return next(loginError);
        req.session.role = user.role;
        recordSignIn(user).then(() => res.json(sessionBody(req, user, ctx.config.demo)), next);
      });
    })(req, res, next);
  });

  router.get('/', requireSignIn, (req, res) => {
    res.json(sessionBody(req, currentUser(req), ctx.config.demo));
  });

  router.delete('/', requireSignIn, (req: Request, res: Response, next: NextFunction) => {
    req.logOut((error) => {
      if (error) return next(error);
      req.session.destroy((destroyError) => {
        if (destroyError) return next(destroyError);
        res.clearCookie('printwarden.sid').status(204).end();
      });
    });
  });

  router.post('/password', requireSignIn, validate(PasswordChangeSchema), async (req, res) => {
    const input = parsed<PasswordChangeInput>(res);
    await changeOwnPassword(ctx, currentUser(req), input, req.sessionID);
    res.status(204).end();
  });

  return router;
}
