import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { SourceInput } from '@shared/schemas/registrar';
import type { SourceView } from '@shared/types/registrar';
import { api } from './api-client';
import { invalidateCatalogue } from './catalogue';

/** Donors, sellers and lenders: the Sources page and the print form both read them. */
export const sourceQueries = {
  all: ['sources'] as const,
  list: () =>
    queryOptions({
      queryKey: [...sourceQueries.all, 'list'] as const,
      queryFn: async () => (await api<{ items: SourceView[] }>('/sources')).items,
    }),
};

/** Adds a source (no `id`) or changes one; the list and prints that name it refresh. */
export function useSaveSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id?: number; body: SourceInput }) =>
      api<SourceView>(id ? `/sources/${id}` : '/sources', {
        method: id ? 'PATCH' : 'POST',
        body,
      }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: sourceQueries.all });
      void invalidateCatalogue(queryClient);
    },
  });
}
