import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PrintUpdate } from '@shared/schemas/print';
import type { PrintView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';
import { invalidateCatalogue, printQueries } from '@/lib/catalogue';

export function useUpdatePrint(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PrintUpdate) => api<PrintView>(`/prints/${id}`, { method: 'PATCH', body }),
    onSuccess: (print) => {
      queryClient.setQueryData(printQueries.detail(id).queryKey, print);
      void invalidateCatalogue(queryClient);
    },
  });
}
