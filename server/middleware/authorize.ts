import type { NextFunction, Request, Response } from 'express';
import { roleCan, type Ability } from '../../shared/domain/roles';
import type { User } from '../models';
import { problems } from './problem';

/** The signed-in person as the session holds them. */
export type SignedInUser = User;

/** The signed-in user, or 401. */
export function currentUser(req: Request): SignedInUser {
  const user = req.user as User | undefined;
  if (!user) throw problems.unauthorized();
  return user;
}

/** 401 without a session, 403 without every listed ability. */
export function requireAbility(...abilities: Ability[]) {
  return (req: Request, _res: Response, next: NextFunction) => {
    const user = currentUser(req);
    if (!abilities.every((ability) => roleCan(user.role, ability))) throw problems.forbidden();
    next();
  };
}

export const requireSignIn = (req: Request, _res: Response, next: NextFunction) => {
  currentUser(req);
  next();
};
