import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChecklistView, SavedSearchView } from '@shared/types/catalogue';
import { api } from '@/lib/api-client';
import { checklistQueries, savedSearchQueries } from './search-queries';

export function useSaveSearch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { name: string; query: string }) =>
      api<SavedSearchView>('/saved-searches', { method: 'POST', body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: savedSearchQueries.all }),
  });
}

export function useDeleteSavedSearch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/saved-searches/${id}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: savedSearchQueries.all }),
  });
}

export function useCreateChecklist() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { name: string; printIds: number[] }) =>
      api<ChecklistView>('/checklists', { method: 'POST', body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: checklistQueries.all }),
  });
}

/** Renames or reorders; the detail is replaced at once with the server's answer. */
export function useUpdateChecklist(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { name?: string; printIds?: number[] }) =>
      api<ChecklistView>(`/checklists/${id}`, { method: 'PATCH', body }),
    onSuccess: (checklist) => {
      queryClient.setQueryData(checklistQueries.detail(id).queryKey, checklist);
      void queryClient.invalidateQueries({ queryKey: checklistQueries.list().queryKey });
    },
  });
}

export function useDeleteChecklist() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/checklists/${id}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: checklistQueries.all }),
  });
}

/** Puts picked prints on the end of an existing checklist. */
export function useAppendToChecklist() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, printIds }: { id: number; printIds: number[] }) =>
      api<ChecklistView>(`/checklists/${id}`, { method: 'PATCH', body: { printIds } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: checklistQueries.all }),
  });
}
