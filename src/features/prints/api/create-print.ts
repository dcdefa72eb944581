import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PrintCreate } from '@shared/schemas/print';
import type { PrintView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';
import { invalidateCatalogue, printQueries } from '@/lib/catalogue';

export function useCreatePrint() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PrintCreate) => api<PrintView>('/prints', { method: 'POST', body }),
    onSuccess: (print) => {
      queryClient.setQueryData(printQueries.detail(print.id).queryKey, print);
      void invalidateCatalogue(queryClient);
    },
  });
}
