import { queryOptions, useMutation } from '@tanstack/react-query';
import type { EnvironmentAlertView } from '@shared/types/environment';
import { api } from './api-client';
import { catalogueKeys, useInvalidateCatalogue } from './catalogue';

/** Places whose readings left their band: the tone watch lists them, a place's page shows its own. */
export const placeAlertQueries = {
  list: () =>
    queryOptions({
      queryKey: catalogueKeys.placeAlerts(),
      queryFn: async () =>
        (await api<{ items: EnvironmentAlertView[] }>('/environment-alerts')).items,
    }),
};

/** Marks a place's alert as seen (conservators and admins). */
export function useAcknowledgePlaceAlert() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (id: number) =>
      api<EnvironmentAlertView>(`/environment-alerts/${id}/acknowledgement`, { method: 'POST' }),
    onSuccess: () => invalidate(),
  });
}
