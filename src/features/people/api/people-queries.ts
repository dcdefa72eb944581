import { queryOptions } from '@tanstack/react-query';
import type { InvitationsResponse, UsersResponse } from '@shared/types/people';
import { api } from '@/lib/api-client';

export const peopleQueries = {
  all: ['people'] as const,
  users: () =>
    queryOptions({
      queryKey: [...peopleQueries.all, 'users'],
      queryFn: async () => (await api<UsersResponse>('/users')).items,
    }),
  invitations: () =>
    queryOptions({
      queryKey: [...peopleQueries.all, 'invitations'],
      queryFn: async () => (await api<InvitationsResponse>('/users/invitations')).items,
    }),
};
