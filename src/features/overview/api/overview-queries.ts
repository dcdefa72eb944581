import { queryOptions } from '@tanstack/react-query';
import type { OverviewResponse } from '@shared/types/overview';
import { api } from '@/lib/api-client';

/** The start page's summary (`GET /api/overview`), for the signed-in person's role. */
export const overviewQueries = {
  all: ['overview'] as const,
  mine: () =>
    queryOptions({
      queryKey: [...overviewQueries.all, 'mine'],
      queryFn: () => api<OverviewResponse>('/overview'),
      // Counts move as others work (checks logged, images processed): fresh on each visit.
      staleTime: 0,
    }),
};
