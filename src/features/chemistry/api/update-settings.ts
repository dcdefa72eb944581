import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChemistrySettingsUpdate } from '@shared/schemas/chemistry';
import type { ChemistrySettingsView } from '@shared/types/chemistry';
import { api } from '@/lib/api-client';
import { chemistryQueries } from './chemistry-queries';

/** Changes chemistry settings; prints' risk marks may change with the fixer capacity. */
export function useUpdateChemistrySettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ChemistrySettingsUpdate) =>
      api<ChemistrySettingsView>('/chemistry/settings', { method: 'PATCH', body }),
    onSuccess: (view) => {
      queryClient.setQueryData(chemistryQueries.settings().queryKey, view);
      void queryClient.invalidateQueries({ queryKey: chemistryQueries.all });
      void queryClient.invalidateQueries({ queryKey: ['prints'] });
    },
  });
}
