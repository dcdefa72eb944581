import { queryOptions } from '@tanstack/react-query';
import type { PrintingLogView } from '@shared/types/chemistry';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/lib/catalogue';

/** A negative's printing log: every print made from it and starting exposures. */
export const printingLogQueries = {
  detail: (negativeId: number) =>
    queryOptions({
      queryKey: catalogueKeys.printingLog(negativeId),
      queryFn: () => api<PrintingLogView>(`/negatives/${negativeId}/printing-log`),
    }),
};
