import type { NextFunction, Request, Response } from 'express';
import type { User } from '../models';

/**
 * When an admin changes someone's role, that person's next request gets a new session id
 * (the sign-in, user and CSRF token carried over): a session id seen under the old role
 * is not trusted with the new one.
 */
export function regenerateOnRoleChange(req: Request, _res: Response, next: NextFunction) {
  const user = req.user as User | undefined;
  if (!user || req.session.role === user.role) return next();
  if (req.session.role === undefined) {
    req.session.role = user.role;
    return next();
  }
  const { passport, csrfToken } = req.session;
  req.session.regenerate((error) => {
    if (error) return next(error);
    Object.assign(req.session, { passport, csrfToken, role: user.role });
    next();
  });
}
