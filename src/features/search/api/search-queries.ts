import { queryOptions } from '@tanstack/react-query';
import type { ChecklistSummary, ChecklistView, SavedSearchView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/lib/catalogue';

/** The search as it stands in the address bar: every key of the contract's query. */
export type SearchParams = Record<string, string>;

/** Saved searches are a person's own words, not prints: their key is the search area's. */
export const savedSearchQueries = {
  all: ['saved-searches'] as const,
  list: () =>
    queryOptions({
      queryKey: [...savedSearchQueries.all, 'list'],
      queryFn: async () => (await api<{ items: SavedSearchView[] }>('/saved-searches')).items,
    }),
};

/** Checklists show prints (titles, order), so they live under the catalogue's keys. */
export const checklistQueries = {
  all: catalogueKeys.checklists(),
  list: () =>
    queryOptions({
      queryKey: [...catalogueKeys.checklists(), 'list'],
      queryFn: async () => (await api<{ items: ChecklistSummary[] }>('/checklists')).items,
    }),
  detail: (id: number) =>
    queryOptions({
      queryKey: catalogueKeys.checklist(id),
      queryFn: () => api<ChecklistView>(`/checklists/${id}`),
    }),
};
