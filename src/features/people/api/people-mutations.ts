import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitationCreateInput, UserUpdateInput } from '@shared/schemas/people';
import type { InvitationView, UserView } from '@shared/types/people';
import { api } from '@/lib/api-client';
import { peopleQueries } from './people-queries';

function useInvalidatePeople() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: peopleQueries.all });
}

export function useInviteUser() {
  const invalidate = useInvalidatePeople();
  return useMutation({
    mutationFn: (body: InvitationCreateInput) =>
      api<InvitationView>('/users/invitations', { method: 'POST', body }),
    onSuccess: invalidate,
  });
}

export function useUpdateUser() {
  const invalidate = useInvalidatePeople();
  return useMutation({
    mutationFn: ({ id, body }: { id: number; body: UserUpdateInput }) =>
      api<UserView>(`/users/${id}`, { method: 'PATCH', body }),
    onSuccess: invalidate,
  });
}

export function useResendInvitation() {
  const invalidate = useInvalidatePeople();
  return useMutation({
    mutationFn: (id: number) =>
      api<InvitationView>(`/users/invitations/${id}/resend`, { method: 'POST' }),
    onSuccess: invalidate,
  });
}

export function useRevokeInvitation() {
  const invalidate = useInvalidatePeople();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/users/invitations/${id}`, { method: 'DELETE' }),
    onSuccess: invalidate,
  });
}
