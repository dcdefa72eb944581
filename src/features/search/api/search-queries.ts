import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type {
  ChecklistSummary,
  ChecklistView,
  PrintListResponse,
  SavedSearchView,
} from '@shared/types/catalogue';
import { api } from '@/lib/api-client';

/** The search as it stands in the address bar: every key of the contract's query. */
export type SearchParams = Record<string, string>;

/**
 * Query keys: search › results(params); saved-searches › list; checklists › list, detail(id).
 * Results keep the previous answer while the next one loads, so typing never flickers.
 */
export const searchQueries = {
  all: ['search'] as const,
  results: (params: SearchParams) =>
    queryOptions({
      queryKey: [...searchQueries.all, 'results', params],
      queryFn: ({ signal }) => api<PrintListResponse>('/prints', { query: params, signal }),
      placeholderData: keepPreviousData,
    }),
  /** The whole collection's minute bands, for the histograms behind the range controls. */
  collection: () =>
    queryOptions({
      queryKey: [...searchQueries.all, 'collection'],
      queryFn: () => api<PrintListResponse>('/prints', { query: { pageSize: 1 } }),
      staleTime: 60_000,
    }),
};

export const savedSearchQueries = {
  all: ['saved-searches'] as const,
  list: () =>
    queryOptions({
      queryKey: [...savedSearchQueries.all, 'list'],
      queryFn: async () => (await api<{ items: SavedSearchView[] }>('/saved-searches')).items,
    }),
};

export const checklistQueries = {
  all: ['checklists'] as const,
  list: () =>
    queryOptions({
      queryKey: [...checklistQueries.all, 'list'],
      queryFn: async () => (await api<{ items: ChecklistSummary[] }>('/checklists')).items,
    }),
  detail: (id: number) =>
    queryOptions({
      queryKey: [...checklistQueries.all, 'detail', id],
      queryFn: () => api<ChecklistView>(`/checklists/${id}`),
    }),
};
