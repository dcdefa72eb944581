import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { FixityCheckView } from '@shared/types/asset';
import { api } from '@/lib/api-client';

/** Query keys: all › list; all › detail(id). A running check is polled until it ends. */
export const fixityQueries = {
  all: ['fixity-checks'] as const,
  list: () =>
    queryOptions({
      queryKey: [...fixityQueries.all, 'list'],
      queryFn: () => api<{ items: FixityCheckView[] }>('/fixity-checks'),
      refetchInterval: (query) =>
        query.state.data?.items.some((check) => check.status === 'running') ? 1000 : false,
    }),
};

export function useStartFixityCheck() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<{ id: number }>('/fixity-checks', { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fixityQueries.all }),
  });
}
