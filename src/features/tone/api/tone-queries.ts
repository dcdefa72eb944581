import { queryOptions } from '@tanstack/react-query';
import type {
  AlertView,
  CheckRoundResponse,
  CohortsResponse,
  ToneChecksResponse,
  ToneTrendResponse,
  ToneWatchItem,
} from '@shared/types/tone';
import { api } from '@/lib/api-client';

export type ToneWatchParams = Partial<
  Record<'status' | 'locationId' | 'paperId' | 'scope', string>
>;

/** Query keys and fetchers of the tone area (checks, trend, watch list, alerts, …). */
export const toneQueries = {
  all: ['tone'] as const,
  checks: (printId: number) =>
    queryOptions({
      queryKey: [...toneQueries.all, 'checks', printId],
      queryFn: () => api<ToneChecksResponse>(`/prints/${printId}/tone-checks`),
    }),
  trend: (printId: number) =>
    queryOptions({
      queryKey: [...toneQueries.all, 'trend', printId],
      queryFn: () => api<ToneTrendResponse>(`/prints/${printId}/tone-trend`),
    }),
  watch: (params: ToneWatchParams) =>
    queryOptions({
      queryKey: [...toneQueries.all, 'watch', params],
      queryFn: () =>
        api<{ items: ToneWatchItem[]; total: number }>('/tone-watch', { query: params }),
    }),
  alerts: () =>
    queryOptions({
      queryKey: [...toneQueries.all, 'alerts'],
      queryFn: () => api<{ items: AlertView[] }>('/alerts'),
    }),
  round: (from: string, to: string) =>
    queryOptions({
      queryKey: [...toneQueries.all, 'round', from, to],
      queryFn: () => api<CheckRoundResponse>('/tone-rounds', { query: { from, to } }),
    }),
  cohorts: (by: string) =>
    queryOptions({
      queryKey: [...toneQueries.all, 'cohorts', by],
      queryFn: () => api<CohortsResponse>('/cohorts', { query: { by } }),
    }),
};
