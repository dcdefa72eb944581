import type { Express } from 'express';

/** One route as Express registered it: lower-case method and the full path pattern. */
export interface RouteEntry {
  method: string;
  path: string;
}

/** The parts of router 2's Layer and Route we read (not in @types/express). */
interface LayerLike {
  rawPath?: unknown;
  route?: { path: unknown; methods: Record<string, boolean> };
  handle?: { stack?: LayerLike[] };
}

function joinPath(prefix: string, path: string): string {
  const joined = `${prefix}/${path}`.replace(/\/+/g, '/');
  return joined.length > 1 ? joined.replace(/\/$/, '') : joined;
}

function pathsOf(raw: unknown): string[] {
  const list = Array.isArray(raw) ? raw.flat(Infinity) : [raw];
  // Regular-expression paths cannot be listed as patterns; none are used.
  return list.filter((path): path is string => typeof path === 'string');
}

function walk(stack: LayerLike[], prefix: string, into: RouteEntry[]): RouteEntry[] {
  for (const layer of stack) {
    if (layer.route) {
      const methods = Object.keys(layer.route.methods).filter((m) => m !== '_all');
      for (const path of pathsOf(layer.route.path)) {
        for (const method of methods) into.push({ method, path: joinPath(prefix, path) });
      }
    } else if (layer.handle?.stack) {
      // A mounted router: app.use('/api/x', router) keeps its mount path in rawPath.
      for (const mount of pathsOf(layer.rawPath))
        walk(layer.handle.stack, joinPath(prefix, mount), into);
    }
  }
  return into;
}

/**
 * Every route of an Express 5 app, mounted routers included, read from the app's own
 * router stack (router 2: `app.router.stack`, each Layer with `route` or a nested `stack`).
 */
export function listRoutes(app: Express): RouteEntry[] {
  const router = (app as unknown as { router: { stack: LayerLike[] } }).router;
  return walk(router.stack, '', []);
}

/** A pattern such as `/api/prints/:id.jsonld` or `/{*splat}` as an anchored expression. */
export function patternToRegExp(pattern: string): RegExp {
  const source = pattern
    .replace(/[.+?^$()[\]\\|]/g, '\\$&')
    .replace(/\{\*[A-Za-z_$][\w$]*\}|\*[A-Za-z_$][\w$]*/g, '.*')
    .replace(/:[A-Za-z_$][\w$]*/g, '[^/]+?');
  return new RegExp(`^${source}/?$`);
}

/** Finds the registered pattern a request path matched, so logs never carry ids or tokens. */
export function routeMatcher(app: Express): (method: string, path: string) => string | null {
  let compiled: Array<RouteEntry & { test: RegExp }> | null = null;
  return (method, path) => {
    compiled ??= listRoutes(app).map((route) => ({ ...route, test: patternToRegExp(route.path) }));
    const wanted = method.toLowerCase() === 'head' ? 'get' : method.toLowerCase();
    const found = compiled.find((route) => route.method === wanted && route.test.test(path));
    return found?.path ?? null;
  };
}
