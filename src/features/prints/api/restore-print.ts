import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PrintView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';
import { invalidateCatalogue, printQueries } from '@/lib/catalogue';

export function useRestorePrint() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<PrintView>(`/prints/${id}/restore`, { method: 'POST' }),
    onSuccess: (print) => {
      queryClient.setQueryData(printQueries.detail(print.id).queryKey, print);
      void invalidateCatalogue(queryClient);
    },
  });
}
