import { queryOptions, useMutation } from '@tanstack/react-query';
import type { PlaceEnvironment, ReadingsImportReport } from '@shared/types/environment';
import { api } from '@/lib/api-client';
import { catalogueKeys, useInvalidateCatalogue } from '@/lib/catalogue';

/** A place's environment over a period; empty dates ask for the year up to its last reading. */
export const environmentQueries = {
  place: (placeId: number, from = '', to = '') =>
    queryOptions({
      queryKey: catalogueKeys.environment(placeId, from, to),
      queryFn: () =>
        api<PlaceEnvironment>(`/locations/${placeId}/environment`, { query: { from, to } }),
    }),
};

export interface ReadingsUploadInput {
  file: File;
  loggerId: string;
  timeZone: string;
  /** Column names; all three empty lets the server use the logger's remembered ones or guess. */
  columns: { timestamp: string; temperature: string; humidity: string };
  dryRun: boolean;
}

/** Uploads (or checks, with `dryRun`) a logger export for a place. */
export function useUploadReadings(placeId: number) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (input: ReadingsUploadInput) => {
      const form = new FormData();
      if (input.loggerId) form.set('loggerId', input.loggerId);
      if (input.timeZone) form.set('timeZone', input.timeZone);
      const { timestamp, temperature, humidity } = input.columns;
      if (timestamp && temperature && humidity) {
        form.set('mapping', JSON.stringify({ timestamp, temperature, humidity }));
      }
      form.set('file', input.file);
      return api<ReadingsImportReport>(`/locations/${placeId}/readings`, {
        method: 'POST',
        form,
        query: { dryRun: input.dryRun ? 1 : undefined },
      });
    },
    onSuccess: async (report) => {
      if (!report.dryRun) await invalidate();
    },
  });
}
