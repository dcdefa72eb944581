import { queryOptions } from '@tanstack/react-query';
import type { PrintingLogView } from '@shared/types/chemistry';
import { api } from '@/lib/api-client';

/** A negative's printing log: every print made from it and starting exposures. */
export const printingLogQueries = {
  all: ['printing-log'] as const,
  detail: (negativeId: number) =>
    queryOptions({
      queryKey: [...printingLogQueries.all, negativeId],
      queryFn: () => api<PrintingLogView>(`/negatives/${negativeId}/printing-log`),
    }),
};
