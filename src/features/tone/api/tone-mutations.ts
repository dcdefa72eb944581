import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ToneCheckCreateInput, ToneCheckUpdateInput } from '@shared/schemas/tone';
import type { AlertView, ImportResult, ToneCheckResponse } from '@shared/types/tone';
import { api, ApiError } from '@/lib/api-client';
import { useSession } from '@/lib/session';
import { toneQueries } from './tone-queries';

/** Everything the tone area shows, and the print records whose status may have moved. */
function useInvalidateTone() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: toneQueries.all }),
      queryClient.invalidateQueries({ queryKey: ['prints'] }),
    ]);
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
  const session = useSession();
  return useMutation({
    mutationFn: async ({ file, dryRun }: { file: File; dryRun: boolean }) => {
      const form = new FormData();
      form.append('file', file);
      const response = await fetch(`/api/tone-checks/import${dryRun ? '?dryRun=1' : ''}`, {
        method: 'POST',
        body: form,
        credentials: 'same-origin',
        headers: { 'X-CSRF-Token': session.data?.csrfToken ?? '', Accept: 'application/json' },
      });
      const body = await response.json().catch(() => null);
      if (!response.ok) {
        throw new ApiError(
          response.status,
          body?.title ?? '',
          body?.detail ?? '',
          body?.errors ?? [],
        );
      }
      return body as ImportResult;
    },
    onSuccess: (_result, { dryRun }) => (dryRun ? undefined : invalidate()),
  });
}
