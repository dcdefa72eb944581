import type { LoaderFunctionArgs } from 'react-router-dom';
import { conditionQueries } from '@/features/condition/api/condition-queries';
import { searchParamsFrom } from '@/features/search/components/use-search-params-state';
import { toneQueries, type ToneWatchParams } from '@/features/tone/api/tone-queries';
import { LIST_PAGE_SIZE, printQueries } from '@/lib/catalogue';
import { queryClient } from '@/lib/query-client';
import { sessionQueries } from '@/lib/session';
import { referenceQueries } from '@/lib/reference-api';

/**
 * Route loaders that only start a page's first requests and return at once: the requests go
 * out beside the page's code instead of after it has loaded and drawn, and the page's own
 * useQuery takes them up (same keys, so nothing is asked twice). They never hold the page.
 */
function start(..._prefetches: Array<Promise<void>>): null {
  // prefetchQuery never rejects: a failed request stays in the cache for the page to show.
  return null;
}

const prefetch = queryClient.prefetchQuery.bind(queryClient);

const query = (request: Request) => new URL(request.url).searchParams;

export function printsData({ request }: LoaderFunctionArgs) {
  const params = Object.fromEntries(query(request).entries());
  return start(
    prefetch(printQueries.list({ pageSize: String(LIST_PAGE_SIZE), ...params })),
    prefetch(referenceQueries.papers()),
  );
}

export function searchData({ request }: LoaderFunctionArgs) {
  const params = searchParamsFrom(query(request));
  return start(
    prefetch(printQueries.list({ pageSize: String(LIST_PAGE_SIZE), ...params })),
    prefetch(referenceQueries.papers()),
    prefetch(printQueries.collection()),
  );
}

export function printRecordData({ params }: LoaderFunctionArgs) {
  const id = Number(params.id);
  if (!Number.isInteger(id) || id <= 0) return null;
  return start(
    prefetch(printQueries.detail(id)),
    prefetch(toneQueries.checks(id)),
    prefetch(toneQueries.trend(id)),
    ...(mayReadCondition()
      ? [prefetch(conditionQueries.reports(id)), prefetch(conditionQueries.treatments(id))]
      : []),
  );
}

/**
 * Condition reports and treatments are curator+ (a viewer's request answers 403): asked for
 * only when the session already says so. Before the session answers (a first load), the index
 * page's own preloads, chosen by role on the server, fetch them for those who may read them.
 */
function mayReadCondition(): boolean {
  const session = queryClient.getQueryData(sessionQueries.current().queryKey);
  return session?.abilities.includes('condition:read') ?? false;
}

export function toneWatchData({ request }: LoaderFunctionArgs) {
  const params: ToneWatchParams = Object.fromEntries(query(request).entries());
  return start(
    prefetch(toneQueries.watch(params)),
    prefetch(toneQueries.alerts()),
    prefetch(referenceQueries.papers()),
    prefetch(referenceQueries.locations()),
  );
}
