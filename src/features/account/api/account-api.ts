import { queryOptions, useMutation } from '@tanstack/react-query';
import type {
  InvitationAcceptInput,
  PasswordChangeInput,
  PasswordResetInput,
  PasswordResetRequestInput,
} from '@shared/schemas/people';
import type { InvitationPreview, UserView } from '@shared/types/people';
import { api } from '@/lib/api-client';

export const accountQueries = {
  invitation: (token: string) =>
    queryOptions({
      queryKey: ['invitation', token],
      queryFn: () => api<InvitationPreview>(`/invitations/${encodeURIComponent(token)}`),
      retry: false,
    }),
};

export function useAcceptInvitation(token: string) {
  return useMutation({
    mutationFn: (body: InvitationAcceptInput) =>
      api<{ user: UserView }>(`/invitations/${encodeURIComponent(token)}`, {
        method: 'POST',
        body,
      }),
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (body: PasswordResetRequestInput) =>
      api<{ detail: string }>('/password-resets', { method: 'POST', body }),
  });
}

export function useResetPassword(token: string) {
  return useMutation({
    mutationFn: (body: PasswordResetInput) =>
      api<void>(`/password-resets/${encodeURIComponent(token)}`, { method: 'POST', body }),
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: (body: PasswordChangeInput) =>
      api<void>('/session/password', { method: 'POST', body }),
  });
}

/** The one-time token travels in the link's fragment, which browsers never send to a server. */
export function tokenFromHash(hash: string): string {
  return hash.replace(/^#/, '');
}
