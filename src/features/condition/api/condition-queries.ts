import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  ConditionReportCreate,
  ConditionReportUpdate,
  TreatmentCreate,
} from '@shared/schemas/condition';
import type { ConditionReportView, TreatmentView } from '@shared/types/condition';
import { api } from '@/lib/api-client';

/** Query keys and fetchers: condition › reports(printId) and treatments(printId). */
export const conditionQueries = {
  all: ['condition'] as const,
  reports: (printId: number) =>
    queryOptions({
      queryKey: [...conditionQueries.all, 'reports', printId],
      queryFn: () => api<{ items: ConditionReportView[] }>(`/prints/${printId}/condition-reports`),
    }),
  treatments: (printId: number) =>
    queryOptions({
      queryKey: [...conditionQueries.all, 'treatments', printId],
      queryFn: () => api<{ items: TreatmentView[] }>(`/prints/${printId}/treatments`),
    }),
};

export function useCreateConditionReport(printId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ConditionReportCreate) =>
      api<ConditionReportView>(`/prints/${printId}/condition-reports`, { method: 'POST', body }),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: conditionQueries.reports(printId).queryKey }),
  });
}

/** Corrects a report (audited on the server). */
export function useUpdateConditionReport(printId: number, reportId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ConditionReportUpdate) =>
      api<ConditionReportView>(`/condition-reports/${reportId}`, { method: 'PATCH', body }),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: conditionQueries.reports(printId).queryKey }),
  });
}

export function useDeleteConditionReport(printId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reportId: number) =>
      api<void>(`/condition-reports/${reportId}`, { method: 'DELETE' }),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: conditionQueries.reports(printId).queryKey }),
  });
}

export function useCreateTreatment(printId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: TreatmentCreate) =>
      api<TreatmentView>(`/prints/${printId}/treatments`, { method: 'POST', body }),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: conditionQueries.treatments(printId).queryKey }),
  });
}

/** Where the server renders the printable report. */
export const reportPdfUrl = (printId: number) => `/api/prints/${printId}/report.pdf`;
