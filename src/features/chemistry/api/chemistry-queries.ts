import { queryOptions } from '@tanstack/react-query';
import type { SolutionAnswer, SolutionBatchDetail } from '@shared/types/chemistry';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/lib/catalogue';

export interface SolutionParams {
  chemical: string;
  percent: number;
  volumeMl: number;
}

/** Query keys and fetchers of the chemistry area. */
export const chemistryQueries = {
  all: ['chemistry'] as const,
  solution: (params: SolutionParams) =>
    queryOptions({
      queryKey: [...chemistryQueries.all, 'solution', params],
      queryFn: () =>
        api<SolutionAnswer>('/chemistry/solution', {
          query: { ...params },
        }),
      staleTime: Infinity,
    }),
  batch: (id: number) =>
    queryOptions({
      queryKey: catalogueKeys.batch(id),
      queryFn: () => api<SolutionBatchDetail>(`/solution-batches/${id}`),
    }),
};
