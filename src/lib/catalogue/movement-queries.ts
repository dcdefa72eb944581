import { queryOptions, useMutation } from '@tanstack/react-query';
import type { BulkMove } from '@shared/schemas/movement';
import type { BulkMoveResult, Holdings, Movement } from '@shared/types/movement';
import { api } from '../api-client';
import { useInvalidateCatalogue } from './invalidate';
import { catalogueKeys } from './keys';

/** A print's movements and a place's holdings, on the catalogue's keys. */
export const movementQueries = {
  ofPrint: (id: number) =>
    queryOptions({
      queryKey: catalogueKeys.movements(id),
      queryFn: async () => (await api<{ items: Movement[] }>(`/prints/${id}/movements`)).items,
    }),
  holdings: (placeId: number, on: string) =>
    queryOptions({
      queryKey: catalogueKeys.holdings(placeId, on),
      queryFn: () => api<Holdings>(`/locations/${placeId}/holdings`, { query: { on } }),
    }),
};

/** Moves prints to a place in one step (one movement each); every view of prints follows. */
export function useMovePrints() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (body: BulkMove) => api<BulkMoveResult>('/movements', { method: 'POST', body }),
    onSuccess: () => invalidate(),
  });
}
