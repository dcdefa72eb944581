import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SolutionBatchInput } from '@shared/schemas/reference';
import type { SolutionBatchView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';
import { invalidateCatalogue } from '@/lib/catalogue';
import { referenceQueries } from '@/lib/reference-api';

/** Saves a solution the maker worked out as a new batch, in one step. */
export function useSaveBatch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SolutionBatchInput) =>
      api<SolutionBatchView>('/solution-batches', { method: 'POST', body }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: referenceQueries.batches().queryKey });
      // A new batch can move the fixer rules of prints already through that bath.
      void invalidateCatalogue(queryClient);
    },
  });
}
