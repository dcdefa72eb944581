import { queryOptions } from '@tanstack/react-query';
import type { AuditEventView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';
import { printQueries } from './print-queries';

/** The audit trail of one print, newest first; refreshed with the record. */
export const printHistoryQuery = (id: number) =>
  queryOptions({
    queryKey: [...printQueries.detail(id).queryKey, 'history'],
    queryFn: async () =>
      (
        await api<{ events: AuditEventView[] }>('/audit', {
          query: { entity: 'print', entityId: id },
        })
      ).events,
  });
