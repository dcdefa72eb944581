import type { Role } from '../../../shared/domain/roles';

/**
 * One row of the role matrix: a route as Express registered it, and who may call it.
 * Each area keeps its rows in `rows/<area>.ts` (exporting `rows: MatrixRow[]`); the
 * matrix test reads every route from the app and fails on any route without a row.
 */
export interface MatrixRow {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** The full path as registered, e.g. `/api/prints/:id`. */
  path: string;
  /** Roles that may call it; `'anyone'` for routes open without a session. */
  allowed: readonly Role[] | 'anyone';
  /** Only while the built-in mail server runs, and similar conditions: a short why. */
  note?: string;
  /**
   * Values for the path's parameters. By default every `:param` is `1`: the matrix test
   * creates one paper, negative, place, solution batch and print first, so `1` is real.
   */
  params?: Record<string, string>;
  /** A body for POST/PUT/PATCH; by default `{}` (allowed roles then get a 4xx, not 401/403). */
  body?: unknown;
}
