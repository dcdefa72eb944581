import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ToneCheckCreateInput, ToneCheckUpdateInput } from '@shared/schemas/tone';
import type { AlertView, ImportResult, ToneCheckResponse } from '@shared/types/tone';
import { api } from '@/lib/api-client';
import { invalidateCatalogue } from '@/lib/catalogue';

/** Every view of prints (tone panel, watch list, record, lists) through the catalogue's rule. */
function useInvalidateTone() {
  const queryClient = useQueryClient();
  return () => invalidateCatalogue(queryClient);
}

export function useLogToneCheck(printId: number) {
  const invalidate = useInvalidateTone();
  return useMutation({
    mutationFn: (body: ToneCheckCreateInput) =>
      api<ToneCheckResponse>(`/prints/${printId}/tone-checks`, { method: 'POST', body }),
    onSuccess: invalidate,
  });
}

/** Corrects a past check, or makes it the baseline (audited on the server). */
export function useUpdateToneCheck(id: number) {
  const invalidate = useInvalidateTone();
  return useMutation({
    mutationFn: (body: ToneCheckUpdateInput) =>
      api<ToneCheckResponse>(`/tone-checks/${id}`, { method: 'PATCH', body }),
    onSuccess: invalidate,
  });
}

export function useDeleteToneCheck() {
  const invalidate = useInvalidateTone();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/tone-checks/${id}`, { method: 'DELETE' }),
    onSuccess: invalidate,
  });
}

export function useAcknowledgeAlert() {
  const invalidate = useInvalidateTone();
  return useMutation({
    mutationFn: (id: number) => api<AlertView>(`/alerts/${id}/acknowledgement`, { method: 'POST' }),
    onSuccess: invalidate,
  });
}

/** Uploads a CGATS.17 file; `dryRun` only previews what it would create and skip. */
export function useImportToneChecks() {
  const invalidate = useInvalidateTone();
  return useMutation({
    mutationFn: ({ file, dryRun }: { file: File; dryRun: boolean }) => {
      const form = new FormData();
      form.append('file', file);
      return api<ImportResult>('/tone-checks/import', {
        method: 'POST',
        form,
        query: { dryRun: dryRun ? 1 : undefined },
      });
    },
    onSuccess: (_result, { dryRun }) => (dryRun ? undefined : invalidate()),
  });
}
