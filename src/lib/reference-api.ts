import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  LocationView,
  NegativeView,
  PaperView,
  SolutionBatchView,
} from '@shared/types/catalogue';
import { api } from './api-client';
import { invalidateCatalogue } from './catalogue';

/** The lists a print links to; several features read them, so they live here. */
type ResourcePath = '/papers' | '/negatives' | '/locations' | '/solution-batches';

const referenceKey = (path: ResourcePath) => ['reference', path] as const;

function listQuery<T>(path: ResourcePath) {
  return queryOptions({
    queryKey: [...referenceKey(path), 'list'] as const,
    queryFn: async () => (await api<{ items: T[] }>(path)).items,
  });
}

export const referenceQueries = {
  all: ['reference'] as const,
  papers: () => listQuery<PaperView>('/papers'),
  negatives: () => listQuery<NegativeView>('/negatives'),
  locations: () => listQuery<LocationView>('/locations'),
  batches: () => listQuery<SolutionBatchView>('/solution-batches'),
};

/** Create, update or delete in one of the lists, refreshing it (and prints that show it). */
export function useReferenceMutation<Body>(path: ResourcePath) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body, remove }: { id?: number; body?: Body; remove?: boolean }) =>
      api<unknown>(id ? `${path}/${id}` : path, {
        method: remove ? 'DELETE' : id ? 'PATCH' : 'POST',
        body: remove ? undefined : body,
      }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: referenceKey(path) });
      void invalidateCatalogue(queryClient);
    },
  });
}
