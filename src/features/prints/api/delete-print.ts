import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { printQueries } from './print-queries';

export function useDeletePrint(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/prints/${id}`, { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: printQueries.detail(id).queryKey });
      void queryClient.invalidateQueries({ queryKey: printQueries.lists() });
    },
  });
}
