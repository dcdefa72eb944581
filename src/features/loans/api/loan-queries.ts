import { queryOptions, useMutation } from '@tanstack/react-query';
import type { LoanCreate, LoanUpdate } from '@shared/schemas/loan';
import type { ConditionReportView } from '@shared/types/condition';
import type { LoanSummary, LoanView, PrintLight } from '@shared/types/loan';
import { api } from '@/lib/api-client';
import { catalogueKeys, useInvalidateCatalogue } from '@/lib/catalogue';

/** Loans, one loan, a print's light dose and its condition reports (for linking). */
export const loanQueries = {
  list: () =>
    queryOptions({
      queryKey: catalogueKeys.loans(),
      queryFn: async () => (await api<{ items: LoanSummary[] }>('/loans')).items,
    }),
  detail: (id: number) =>
    queryOptions({
      queryKey: catalogueKeys.loan(id),
      queryFn: () => api<LoanView>(`/loans/${id}`),
    }),
  light: (printId: number) =>
    queryOptions({
      queryKey: catalogueKeys.light(printId),
      queryFn: () => api<PrintLight>(`/prints/${printId}/light`),
    }),
  /** The same key and answer as the condition area's reports of a print: one cache entry. */
  reports: (printId: number) =>
    queryOptions({
      queryKey: catalogueKeys.conditionReports(printId),
      queryFn: () => api<{ items: ConditionReportView[] }>(`/prints/${printId}/condition-reports`),
    }),
};

/** A new loan or exhibition; the loans list and light views follow. */
export function useCreateLoan() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (body: Omit<LoanCreate, 'printIds'> & { printIds: number[] }) =>
      api<LoanView>('/loans', { method: 'POST', body }),
    onSuccess: () => invalidate(),
  });
}

/** Any change to a loan: a stage moves prints, so every view of prints follows. */
export function useUpdateLoan(id: number) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (body: LoanUpdate) => api<LoanView>(`/loans/${id}`, { method: 'PATCH', body }),
    onSuccess: () => invalidate(),
  });
}
