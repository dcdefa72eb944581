import { queryOptions } from '@tanstack/react-query';
import { printQueries } from '@/lib/catalogue';

/** The print a condition form belongs to; the same key as the record page, so one cache entry. */
export const printForCondition = (id: number) =>
  queryOptions({
    ...printQueries.detail(id),
    // Photographs may have been added since the record was shown: always ask again.
    staleTime: 0,
  });
