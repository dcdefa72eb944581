import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { AuditEventView, PrintListResponse, PrintView } from '@shared/types/catalogue';
import { api } from '../api-client';
import { catalogueKeys, normaliseListParams, type PrintListParams } from './keys';

/** Rows on one page of the Prints list and of Search (their route loaders ask for the same). */
export const LIST_PAGE_SIZE = 25;

/** Fetchers of the catalogue's prints, on the keys of `catalogueKeys`. */
export const printQueries = {
  /**
   * One page of prints: the Prints list and Search ask through this one query, so the same
   * question is one cache entry. The previous page stays while the next loads (no flicker).
   */
  list: (params: PrintListParams) =>
    queryOptions({
      queryKey: catalogueKeys.list(params),
      queryFn: ({ signal }) =>
        api<PrintListResponse>('/prints', { query: normaliseListParams(params), signal }),
      placeholderData: keepPreviousData,
    }),
  /** The whole collection's minute bands, for the histograms behind the range controls. */
  collection: () =>
    queryOptions({
      queryKey: catalogueKeys.collection(),
      queryFn: () => api<PrintListResponse>('/prints', { query: { pageSize: 1 } }),
      staleTime: 60_000,
    }),
  detail: (id: number) =>
    queryOptions({
      queryKey: catalogueKeys.print(id),
      queryFn: () => api<PrintView>(`/prints/${id}`),
    }),
  /** The audit trail of one print, newest first. */
  history: (id: number) =>
    queryOptions({
      queryKey: catalogueKeys.history(id),
      queryFn: async () =>
        (
          await api<{ events: AuditEventView[] }>('/audit', {
            query: { entity: 'print', entityId: id },
          })
        ).events,
    }),
};
