import { useMutation } from '@tanstack/react-query';
import type { AssetView } from '@shared/domain/asset-views';
import type { SampleRegionInput } from '@shared/schemas/asset';
import type { AssetRecord, SampleResult } from '@shared/types/asset';
import { api, ApiError, csrfHeader, problemFrom } from '@/lib/api-client';
import { useInvalidateCatalogue } from '@/lib/catalogue';

/**
 * Uploads one file with XMLHttpRequest, the one browser API that reports upload progress;
 * `onProgress` gets 0–1. Resolves with the stored asset or rejects with the server's problem.
 */
export function uploadAsset(
  printId: number,
  file: File,
  view: AssetView,
  onProgress: (fraction: number) => void,
): Promise<AssetRecord> {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', `/api/prints/${printId}/assets`);
    for (const [name, value] of Object.entries(csrfHeader())) request.setRequestHeader(name, value);
    request.setRequestHeader('Accept', 'application/json');
    request.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    request.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(request.responseText || 'null');
      } catch {
        // A proxy's HTML error page: the status alone says what happened.
      }
      if (request.status === 201) return resolve(body as AssetRecord);
      reject(problemFrom(request.status, 'Upload failed', body));
    };
    request.onerror = () => reject(new ApiError(0, 'Upload interrupted', 'Check the connection.'));
    const form = new FormData();
    form.append('view', view);
    // The same file again on this print is a slip: the server refuses it (409) and says which image it repeats.
    form.append('repeat', 'refuse');
    form.append('file', file);
    request.send(form);
  });
}

export function useDeleteAsset() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (assetId: number) => api<void>(`/assets/${assetId}`, { method: 'DELETE' }),
    onSuccess: () => invalidate(),
  });
}

export function useSampleRegion(assetId: number) {
  return useMutation({
    mutationFn: (region: SampleRegionInput) =>
      api<SampleResult>(`/assets/${assetId}/samples`, { method: 'POST', body: region }),
  });
}

export interface ToneCheckDraft {
  checkedOn: string;
  method: 'scan';
  instrument: string | null;
  illuminant: 'D50';
  observer: '2';
  baseline: boolean;
  readings: Array<{ patch: string; L: number; a: number; b: number }>;
}

/**
 * Sends scan samples as a tone check (the contract's tone-check route); the tone panel, the
 * record and every list refresh through the catalogue's one rule.
 */
export function useRecordToneCheck(printId: number) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (draft: ToneCheckDraft) =>
      api<unknown>(`/prints/${printId}/tone-checks`, { method: 'POST', body: draft }),
    onSuccess: () => invalidate(),
  });
}
