import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useInvalidateCatalogue } from '@/lib/catalogue';

export function useDeletePrint(id: number) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: () => api<void>(`/prints/${id}`, { method: 'DELETE' }),
    onSuccess: () => void invalidate({ removed: [id] }),
  });
}
