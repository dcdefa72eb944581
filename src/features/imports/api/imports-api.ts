import { queryOptions, useMutation } from '@tanstack/react-query';
import type { ImportEncoding } from '@shared/domain/text-encoding';
import type { ImportInspection, ImportJobView } from '@shared/types/imports';
import { api } from '@/lib/api-client';
import { useInvalidateCatalogue } from '@/lib/catalogue';

/** Query keys and fetchers: imports › detail(id), polled while the import runs. */
export const importQueries = {
  all: ['imports'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...importQueries.all, 'detail', id],
      queryFn: () => api<ImportJobView>(`/imports/${id}`),
      refetchInterval: (query) => {
        const status = query.state.data?.status;
        return status === 'done' || status === 'failed' ? false : 400;
      },
    }),
};

export function useInspectCsv() {
  return useMutation({
    mutationFn: ({ file, encoding }: { file: File; encoding: ImportEncoding }) => {
      const form = new FormData();
      form.set('file', file);
      return api<ImportInspection>('/imports/inspection', {
        method: 'POST',
        form,
        query: { encoding },
      });
    },
  });
}

export function useStartImport() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (input: {
      file: File;
      mapping: Record<string, string>;
      dryRun: boolean;
      encoding: ImportEncoding;
    }) => {
      const form = new FormData();
      form.set('mapping', JSON.stringify(input.mapping));
      form.set('file', input.file);
      return api<{ id: number }>('/imports', {
        method: 'POST',
        form,
        query: { encoding: input.encoding, dryRun: input.dryRun ? 1 : undefined },
      });
    },
    onSuccess: () => invalidate(),
  });
}

export const failedRowsUrl = (id: number) => `/api/imports/${id}/failed.csv`;
