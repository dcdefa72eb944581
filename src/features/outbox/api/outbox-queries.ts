import { queryOptions } from '@tanstack/react-query';
import type { OutboxResponse } from '@shared/types/mail';
import { api } from '@/lib/api-client';

export const outboxQueries = {
  all: ['outbox'] as const,
  list: () =>
    queryOptions({
      queryKey: [...outboxQueries.all, 'list'],
      queryFn: () => api<OutboxResponse>('/outbox'),
      // New mail arrives while the page is open (an invitation just sent, a digest).
      refetchInterval: 5000,
    }),
};
