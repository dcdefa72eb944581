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
import { catalogueKeys } from '@/lib/catalogue';

export type ToneWatchParams = Partial<
  Record<'status' | 'locationId' | 'paperId' | 'scope', string>
>;

/**
 * Fetchers of the tone area. What shows prints' tone (checks, trend, watch list, alerts,
 * rounds, cohorts) is keyed under the catalogue, so the one rule refreshes it.
 */
export const toneQueries = {
  checks: (printId: number) =>
    queryOptions({
      queryKey: catalogueKeys.toneChecks(printId),
      queryFn: () => api<ToneChecksResponse>(`/prints/${printId}/tone-checks`),
    }),
  trend: (printId: number) =>
    queryOptions({
      queryKey: catalogueKeys.toneTrend(printId),
      queryFn: () => api<ToneTrendResponse>(`/prints/${printId}/tone-trend`),
    }),
  watch: (params: ToneWatchParams) =>
    queryOptions({
      queryKey: catalogueKeys.toneWatch(params),
      queryFn: () =>
        api<{ items: ToneWatchItem[]; total: number }>('/tone-watch', { query: params }),
    }),
  alerts: () =>
    queryOptions({
      queryKey: catalogueKeys.alerts(),
      queryFn: () => api<{ items: AlertView[] }>('/alerts'),
    }),
  round: (from: string, to: string) =>
    queryOptions({
      queryKey: catalogueKeys.round(from, to),
      queryFn: () => api<CheckRoundResponse>('/tone-rounds', { query: { from, to } }),
    }),
  cohorts: (by: string) =>
    queryOptions({
      queryKey: catalogueKeys.cohorts(by),
      queryFn: () => api<CohortsResponse>('/cohorts', { query: { by } }),
    }),
};
