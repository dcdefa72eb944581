import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OverviewSeenInput } from '@shared/schemas/overview';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/lib/catalogue';

/** Marks one kind of start-page change seen up to now (`POST /api/overview/seen`). */
export function useMarkSeen() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: OverviewSeenInput) => api<void>('/overview/seen', { method: 'POST', body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.overview() }),
  });
}
