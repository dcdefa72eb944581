import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Ability } from '@shared/domain/roles';
import type { SignInInput } from '@shared/schemas/session';
import type { SessionResponse } from '@shared/types/catalogue';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
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

/**
 * Signs out and goes to the sign-in page. The order matters: a page still drawn after its
 * queries were cleared asks for them again, now without a session (a 401 for each). So the
 * queries on their way are cancelled, the session is marked gone (the signed-in pages give
 * way to the sign-in page), and only once that page is shown is the rest of the cache cleared.
 */
export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: async () => {
      await queryClient.cancelQueries();
      await api<void>('/session', { method: 'DELETE' });
    },
    onSuccess: async () => {
      setCsrfToken(null);
      await queryClient.cancelQueries();
      queryClient.setQueryData(sessionQueries.current().queryKey, null);
      await navigate(paths.signIn, { replace: true });
      queryClient.removeQueries({
        predicate: (query) => query.queryKey[0] !== sessionQueries.all[0],
      });
    },
  });
}
