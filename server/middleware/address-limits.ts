import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { normaliseEmail } from '../../shared/domain/email';
import { HttpProblem } from './problem';

const WINDOW_MS = 15 * 60 * 1000;

/**
 * Two limits for a form keyed on an e-mail address, in 15-minute windows: per client and
 * address, so one client cannot lock out all; and per address from every client together
 * (a higher limit), so many clients cannot work on one account without end. Both key on the
 * address as accounts are found (normalised). `failuresOnly` counts only refused requests.
 */
export function addressLimits(options: {
  perClient: number;
  perAccount: number;
  failuresOnly?: boolean;
  title: string;
  detail: string;
}): [RequestHandler, RequestHandler] {
  const limit = (max: number, key: (req: Request) => string) =>
    rateLimit({
      windowMs: WINDOW_MS,
      limit: max,
      skipSuccessfulRequests: options.failuresOnly ?? false,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      keyGenerator: key,
      handler: (_req, _res, next) => next(new HttpProblem(429, options.title, options.detail)),
    });
  const address = (req: Request) => normaliseEmail(req.body?.email);
  return [
    limit(options.perClient, (req) => `${ipKeyGenerator(req.ip ?? '')}|${address(req)}`),
    limit(options.perAccount, address),
  ];
}
