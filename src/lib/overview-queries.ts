import { queryOptions } from '@tanstack/react-query';
import type { OverviewResponse } from '@shared/types/overview';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/lib/catalogue';

/**
 * The start page's summary (`GET /api/overview`), for the signed-in person's role; its
 * counts are of prints, so it is keyed under the catalogue. The start page shows it whole;
 * the page an item links to may show that item again (Fixity: backups and disk).
 */
export const overviewQueries = {
  mine: () =>
    queryOptions({
      queryKey: catalogueKeys.overview(),
      queryFn: () => api<OverviewResponse>('/overview'),
      // Counts move as others work (checks logged, images processed): fresh on each visit.
      staleTime: 0,
    }),
};
