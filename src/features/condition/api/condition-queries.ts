import { queryOptions, useMutation } from '@tanstack/react-query';
import type {
  ConditionReportCreate,
  ConditionReportUpdate,
  TreatmentCreate,
} from '@shared/schemas/condition';
import type { ConditionReportView, TreatmentView } from '@shared/types/condition';
import { api } from '@/lib/api-client';
import { catalogueKeys, useInvalidateCatalogue } from '@/lib/catalogue';

/** Fetchers of a print's condition reports and treatments (keys under the print's own). */
export const conditionQueries = {
  reports: (printId: number) =>
    queryOptions({
      queryKey: catalogueKeys.conditionReports(printId),
      queryFn: () => api<{ items: ConditionReportView[] }>(`/prints/${printId}/condition-reports`),
    }),
  treatments: (printId: number) =>
    queryOptions({
      queryKey: catalogueKeys.treatments(printId),
      queryFn: () => api<{ items: TreatmentView[] }>(`/prints/${printId}/treatments`),
    }),
};

export function useCreateConditionReport(printId: number) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (body: ConditionReportCreate) =>
      api<ConditionReportView>(`/prints/${printId}/condition-reports`, { method: 'POST', body }),
    onSuccess: () => invalidate(),
  });
}

/** Corrects a report (audited on the server). */
export function useUpdateConditionReport(reportId: number) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (body: ConditionReportUpdate) =>
      api<ConditionReportView>(`/condition-reports/${reportId}`, { method: 'PATCH', body }),
    onSuccess: () => invalidate(),
  });
}

export function useDeleteConditionReport() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (reportId: number) =>
      api<void>(`/condition-reports/${reportId}`, { method: 'DELETE' }),
    onSuccess: () => invalidate(),
  });
}

export function useCreateTreatment(printId: number) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (body: TreatmentCreate) =>
      api<TreatmentView>(`/prints/${printId}/treatments`, { method: 'POST', body }),
    onSuccess: () => invalidate(),
  });
}

/** Where the server renders the printable report. */
export const reportPdfUrl = (printId: number) => `/api/prints/${printId}/report.pdf`;
