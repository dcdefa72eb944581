import type { Express } from 'express';
import { listRoutes, type RouteEntry } from '../../../server/routes/route-list';

/** The app's API routes (the client fallback `/{*splat}` is not an API route). */
export function apiRoutesOf(app: Express): RouteEntry[] {
  return listRoutes(app).filter((route) => route.path.startsWith('/api/'));
}

/** `/api/prints/:id` with `{ id: '7' }` → `/api/prints/7`; unnamed parameters become `1`. */
export function fillPath(path: string, params: Record<string, string> = {}): string {
  return path.replace(/:([A-Za-z_$][\w$]*)/g, (_all, name: string) =>
    encodeURIComponent(params[name] ?? '1'),
  );
}
