import type { Ability } from '../../shared/domain/roles';
import { byCodeUnits } from '../../shared/domain/sort-keys';
/**
 * Route-keyed preloads (issue 20): for the page a request opens, the index page names that
 * page's code and, for a signed-in person, its first API answers, so the browser fetches them
 * beside the app's main script instead of after it has run (HTML → main script → page code →
 * API → draw was the chain behind the data pages' first full draw).
 *
 * `modules` are the sources of a route's `lazy` imports (src/app/router.tsx); the Vite plugin
 * `routePreloads` (vite.config.ts) writes their built chunks to `route-preloads.json`.
 * `api` must name the very addresses the route's loader asks for (src/app/route-data.ts,
 * through `api()` and `withQuery`), or the browser fetches twice: the page's `useQuery`
 * takes a preload up only when the address is the same.
 */
export interface RoutePreload {
  name: string;
  pattern: RegExp;
  modules: string[];
  /** `can` says what the signed-in person may read: no preload that would answer 403. */
  api?: (
    match: RegExpMatchArray,
    query: URLSearchParams,
    can: (ability: Ability) => boolean,
  ) => string[];
}

/** LIST_PAGE_SIZE of src/lib/catalogue/print-queries.ts. */
const LIST_PAGE_SIZE = '25';

/** A list address as `withQuery(normaliseListParams(…))` writes it: keys in order. */
function listAddress(params: Record<string, string>): string {
  const sorted = Object.entries(params).sort(([a], [b]) => byCodeUnits(a, b));
  return `/api/prints?${new URLSearchParams(sorted).toString()}`;
}

const onlyKeys = (query: URLSearchParams, allowed: string[]) =>
  [...query.keys()].every((key) => allowed.includes(key));

export const ROUTE_PRELOADS: RoutePreload[] = [
  {
    name: 'signIn',
    pattern: /^\/sign-in\/?$/,
    modules: ['src/features/auth/components/sign-in-page.tsx'],
  },
  {
    name: 'start',
    pattern: /^\/$/,
    modules: ['src/features/overview/components/start-page.tsx'],
    api: () => ['/api/overview'],
  },
  {
    name: 'prints',
    pattern: /^\/prints\/?$/,
    modules: ['src/features/prints/components/prints-list-page.tsx'],
    // Filters and pages change the address: only the plain list is named ahead.
    api: (_match, query) =>
      query.size === 0 ? [listAddress({ pageSize: LIST_PAGE_SIZE }), '/api/papers'] : [],
  },
  {
    name: 'search',
    pattern: /^\/search\/?$/,
    modules: ['src/features/search/components/search-page.tsx'],
    api: (_match, query) => {
      if (!onlyKeys(query, ['q'])) return ['/api/papers', listAddress({ pageSize: '1' })];
      const q = query.get('q');
      return [
        listAddress(q ? { pageSize: LIST_PAGE_SIZE, q } : { pageSize: LIST_PAGE_SIZE }),
        '/api/papers',
        listAddress({ pageSize: '1' }),
      ];
    },
  },
  {
    name: 'record',
    pattern: /^\/prints\/([1-9]\d{0,9})\/?$/,
    // The sections under the record (tone, condition, …) load once it has drawn: preloaded,
    // their chunks would share the connections with what the record needs first.
    modules: ['src/features/prints/components/print-record-page.tsx'],
    api: (match, _query, can) => {
      const print = `/api/prints/${match[1]}`;
      const condition = can('condition:read')
        ? [`${print}/condition-reports`, `${print}/treatments`]
        : [];
      return [print, `${print}/tone-checks`, `${print}/tone-trend`, ...condition];
    },
  },
  {
    name: 'toneWatch',
    pattern: /^\/tone-watch\/?$/,
    modules: ['src/features/tone/components/tone-watch-page.tsx'],
    api: (_match, query, can) =>
      query.size === 0 && can('tone:write')
        ? [
            '/api/tone-watch',
            '/api/alerts',
            '/api/papers',
            ...(can('locations:read') ? ['/api/locations'] : []),
          ]
        : [],
  },
];
