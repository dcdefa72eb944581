import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PrintCreate } from '@shared/schemas/print';
import type { PrintView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';
import { printQueries } from './print-queries';

export function useCreatePrint() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PrintCreate) => api<PrintView>('/prints', { method: 'POST', body }),
    onSuccess: (print) => {
      queryClient.setQueryData(printQueries.detail(print.id).queryKey, print);
      void queryClient.invalidateQueries({ queryKey: printQueries.lists() });
    },
  });
}
