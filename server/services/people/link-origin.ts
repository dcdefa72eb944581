import type { Request } from 'express';
import type { AppContext } from '../../context';

/**
 * Where e-mailed links point: PUBLIC_URL when set (do set it in production, so a forged
 * Host header cannot aim a reset link elsewhere), else the request's own origin.
 */
export function linkOrigin(ctx: AppContext, req: Request): string {
  return ctx.config.publicUrl ?? `${req.protocol}://${req.get('host') ?? 'localhost'}`;
}
