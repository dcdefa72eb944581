import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { SettingsPatch } from '@shared/schemas/settings';
import type { SettingsResponse } from '@shared/types/settings';
import { api } from './api-client';
import { invalidateCatalogue } from './catalogue';

/** The chemistry area's own queries (solutions worked out, which read the settings). */
const chemistryKey = ['chemistry'] as const;

/** The one settings store (`/api/settings`); the settings page and the chemistry area read it. */
export const settingsQueries = {
  all: ['settings'] as const,
  current: () =>
    queryOptions({
      queryKey: [...settingsQueries.all, 'current'] as const,
      queryFn: () => api<SettingsResponse>('/settings'),
    }),
};

/**
 * Saves a change to any area. Settings move what prints derive (tone state, fixer risk), so
 * print lists and records, the tone area and the chemistry area are read again.
 */
export function useSaveSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SettingsPatch) =>
      api<SettingsResponse>('/settings', { method: 'PATCH', body }),
    onSuccess: (view) => {
      queryClient.setQueryData(settingsQueries.current().queryKey, view);
      return Promise.all([
        invalidateCatalogue(queryClient),
        queryClient.invalidateQueries({ queryKey: chemistryKey }),
      ]);
    },
  });
}
