import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportEncoding } from '@shared/domain/text-encoding';
import type { ImportInspection, ImportJobView } from '@shared/types/imports';
import { ApiError } from '@/lib/api-client';
import { useSession } from '@/lib/session';

/** Query keys and fetchers: imports › detail(id), polled while the import runs. */
export const importQueries = {
  all: ['imports'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...importQueries.all, 'detail', id],
      queryFn: async () => {
        const response = await fetch(`/api/imports/${id}`, { credentials: 'same-origin' });
        return readJson<ImportJobView>(response);
      },
      refetchInterval: (query) => {
        const status = query.state.data?.status;
        return status === 'done' || status === 'failed' ? false : 400;
      },
    }),
};

async function readJson<T>(response: Response): Promise<T> {
  const body = await response.json().catch(() => null);
  if (!response.ok) {
    throw new ApiError(
      response.status,
      body?.title ?? response.statusText,
      body?.detail ?? '',
      body?.errors ?? [],
    );
  }
  return body as T;
}

/** A multipart POST with the session's CSRF token. */
function useUpload() {
  const { data: session } = useSession();
  return (path: string, form: FormData) =>
    fetch(`/api${path}`, {
      method: 'POST',
      body: form,
      credentials: 'same-origin',
      headers: { 'X-CSRF-Token': session?.csrfToken ?? '', Accept: 'application/json' },
    });
}

export function useInspectCsv() {
  const upload = useUpload();
  return useMutation({
    mutationFn: async ({ file, encoding }: { file: File; encoding: ImportEncoding }) => {
      const form = new FormData();
      form.set('file', file);
      return readJson<ImportInspection>(
        await upload(`/imports/inspection?encoding=${encoding}`, form),
      );
    },
  });
}

export function useStartImport() {
  const upload = useUpload();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: {
      file: File;
      mapping: Record<string, string>;
      dryRun: boolean;
      encoding: ImportEncoding;
    }) => {
      const form = new FormData();
      form.set('mapping', JSON.stringify(input.mapping));
      form.set('file', input.file);
      const query = new URLSearchParams({ encoding: input.encoding });
      if (input.dryRun) query.set('dryRun', '1');
      const response = await upload(`/imports?${query}`, form);
      return readJson<{ id: number }>(response);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['prints'] }),
  });
}

export const failedRowsUrl = (id: number) => `/api/imports/${id}/failed.csv`;
