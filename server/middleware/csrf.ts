import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { NextFunction, Request, Response } from 'express';
import { problems } from './problem';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
/** Requests that carry their own proof: signing in, and the password-reset requests. */
const EXEMPT = [/^\/api\/session\/?$/, /^\/api\/password-resets(\/[^/]+)?\/?$/];

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

/** The session's CSRF token, made on first use. */
export function csrfTokenOf(req: Request): string {
  req.session.csrfToken ??= randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

/**
 * A signed-in browser must echo its session token in `X-CSRF-Token` on every change.
 * Requests without a session fall through to the 401 of the route itself.
 */
export function csrfProtection(req: Request, _res: Response, next: NextFunction) {
  if (SAFE_METHODS.has(req.method) || !req.user) return next();
  // Mounted under /api, req.path lacks the mount; match the whole path.
  const path = req.baseUrl + req.path;
  if (req.method === 'POST' && EXEMPT.some((pattern) => pattern.test(path))) return next();
  const sent = req.get('x-csrf-token');
  const expected = req.session.csrfToken;
  if (!sent || !expected || !sameToken(sent, expected)) {
    return next(problems.forbidden('Missing or wrong X-CSRF-Token header.'));
  }
  next();
}

function sameToken(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}
