import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { PrintListResponse, PrintView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';

/** The list's query as it appears in the address bar (all strings, all optional). */
export type PrintListParams = Partial<
  Record<
    'q' | 'process' | 'paperId' | 'processingRisk' | 'deleted' | 'sort' | 'page' | 'pageSize',
    string
  >
>;

/** Query keys and fetchers for prints: all › lists › list(params); all › details › detail(id). */
export const printQueries = {
  all: ['prints'] as const,
  lists: () => [...printQueries.all, 'list'] as const,
  list: (params: PrintListParams) =>
    queryOptions({
      queryKey: [...printQueries.lists(), params],
      queryFn: () => api<PrintListResponse>('/prints', { query: params }),
      placeholderData: keepPreviousData,
    }),
  details: () => [...printQueries.all, 'detail'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...printQueries.details(), id],
      queryFn: () => api<PrintView>(`/prints/${id}`),
    }),
};
