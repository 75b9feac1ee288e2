import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChangePasswordBody, UpdateAccountBody, UserView } from '../../../../shared/api/auth';
import { apiFetch } from '../../shared/lib/apiFetch';

/*
 * The account feature only changes things; it reads the person from the session that
 * the auth guard provides. A new name appears in data other features cache (the session,
 * member lists), which this feature cannot name without importing them, so after a
 * rename everything cached is marked stale and refetched as it is shown.
 */
export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateAccountBody) => apiFetch<UserView>('/api/account', { method: 'PATCH', body }),
    onSuccess: () => queryClient.invalidateQueries(),
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: (body: ChangePasswordBody) =>
      apiFetch<void>('/api/account/password', { method: 'POST', body }),
  });
}
