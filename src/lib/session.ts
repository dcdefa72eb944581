import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Ability } from '@shared/domain/roles';
import type { SignInInput } from '@shared/schemas/session';
import type { SessionResponse } from '@shared/types/catalogue';
import { api, ApiError, setCsrfToken } from './api-client';

export const sessionQueries = {
  all: ['session'] as const,
  current: () =>
    queryOptions({
      queryKey: [...sessionQueries.all, 'current'],
      queryFn: async (): Promise<SessionResponse | null> => {
        try {
          const session = await api<SessionResponse>('/session');
          setCsrfToken(session.csrfToken);
          return session;
        } catch (error) {
          if (error instanceof ApiError && error.status === 401) return null;
          throw error;
        }
      },
      staleTime: Infinity,
    }),
};

/** The signed-in session, or null. */
export function useSession() {
  return useQuery(sessionQueries.current());
}

/** Whether the signed-in user may do something; the server decides, this only hides. */
export function useCan(): (ability: Ability) => boolean {
  const { data } = useSession();
  return (ability) => data?.abilities.includes(ability) ?? false;
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignInInput) =>
      api<SessionResponse>('/session', { method: 'POST', body: input }),
    onSuccess: (session) => {
      setCsrfToken(session.csrfToken);
      queryClient.setQueryData(sessionQueries.current().queryKey, session);
    },
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>('/session', { method: 'DELETE' }),
    onSuccess: () => {
      setCsrfToken(null);
      queryClient.clear();
      queryClient.setQueryData(sessionQueries.current().queryKey, null);
    },
  });
}
