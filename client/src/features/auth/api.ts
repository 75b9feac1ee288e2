import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import type { SessionView, SignInBody, SignUpBody } from '../../../../shared/api/auth';
import type {
  PasswordResetBody,
  PasswordResetLookup,
  PasswordResetRequestBody,
  PasswordResetRequested,
} from '../../../../shared/api/password-reset';
import { ApiRequestError, apiFetch } from '../../shared/lib/apiFetch';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  passwordReset: (token: string) => [...authKeys.all, 'password-reset', token] as const,
};

/**
 * Who is signed in, or null when nobody is. A 401 is an answer here, not a failure, so
 * the guard can send the person to sign in instead of showing an error.
 */
export function useMe() {
  return useQuery({
    queryKey: authKeys.me(),
    queryFn: async ({ signal }) => {
      try {
        return await apiFetch<SessionView>('/api/auth/me', { signal });
      } catch (error) {
        if (error instanceof ApiRequestError && error.status === 401) return null;
        throw error;
      }
    },
    staleTime: 60_000,
  });
}

/**
 * A new session replaces everything cached for the previous person, so nothing one
 * account loaded can show up for the next; then the session itself is seeded.
 */
function useStartSession() {
  const queryClient = useQueryClient();
  return (session: SessionView) => {
    queryClient.clear();
    queryClient.setQueryData(authKeys.me(), session);
  };
}

export function useSignIn() {
  const startSession = useStartSession();
  return useMutation({
    mutationFn: (body: SignInBody) => apiFetch<SessionView>('/api/auth/sign-in', { method: 'POST', body }),
    onSuccess: startSession,
  });
}

export function useSignUp() {
  const startSession = useStartSession();
  return useMutation({
    mutationFn: (body: SignUpBody) => apiFetch<SessionView>('/api/auth/sign-up', { method: 'POST', body }),
    onSuccess: startSession,
  });
}

/**
 * Signing out leaves the signed-in pages first and forgets the session after: dropping
 * the session while a guarded page is still on screen would make its guard send the
 * person to sign in with a "come back here" address meant for the next person.
 */
export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: () => apiFetch<void>('/api/auth/sign-out', { method: 'POST' }),
    onSuccess: async () => {
      await navigate('/sign-in', { replace: true });
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (body: PasswordResetRequestBody) =>
      apiFetch<PasswordResetRequested>('/api/auth/password-reset', { method: 'POST', body }),
  });
}

const resetPath = (token: string) => `/api/auth/password-reset/${encodeURIComponent(token)}`;

/** Whether a reset link still works; an unknown link is a 404. */
export function usePasswordResetLookup(token: string) {
  return useQuery({
    queryKey: authKeys.passwordReset(token),
    queryFn: ({ signal }) => apiFetch<PasswordResetLookup>(resetPath(token), { signal }),
  });
}

/** A new password ends every session, this browser's too, so nothing cached outlives it. */
export function useResetPassword(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PasswordResetBody) => apiFetch<void>(resetPath(token), { method: 'POST', body }),
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}
