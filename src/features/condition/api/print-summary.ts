import { queryOptions } from '@tanstack/react-query';
import type { PrintView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';

/** The print a condition form belongs to; the same key as the record page, so one cache entry. */
export const printForCondition = (id: number) =>
  queryOptions({
    queryKey: ['prints', 'detail', id],
    queryFn: () => api<PrintView>(`/prints/${id}`),
    // Photographs may have been added since the record was shown: always ask again.
    staleTime: 0,
  });
