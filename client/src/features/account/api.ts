import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ChangePasswordBody, UpdateAccountBody, UserView } from '../../../../shared/api/auth';
import type { CreatedToken, CreateTokenBody, TokenView } from '../../../../shared/api/tokens';
import type { NotificationSettings } from '../../../../shared/api/notifications';
import { apiFetch } from '../../shared/lib/apiFetch';

/*
 * The account feature reads the person from the session that the auth guard provides.
 * A new name appears in data other features cache (the session,
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

export const accountKeys = {
  all: ['account'] as const,
  tokens: () => [...accountKeys.all, 'tokens'] as const,
  notificationSettings: () => [...accountKeys.all, 'notification-settings'] as const,
};

/** The person's personal API tokens, without their secrets (only the creation answer has one). */
export function useTokens() {
  return useQuery({
    queryKey: accountKeys.tokens(),
    queryFn: ({ signal }) => apiFetch<TokenView[]>('/api/account/tokens', { signal }),
  });
}

export function useCreateToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateTokenBody) =>
      apiFetch<CreatedToken>('/api/account/tokens', { method: 'POST', body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: accountKeys.tokens() }),
  });
}

export function useRevokeToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tokenId: string) =>
      apiFetch<void>(`/api/account/tokens/${encodeURIComponent(tokenId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: accountKeys.tokens() }),
  });
}

export function useNotificationSettings() {
  return useQuery({
    queryKey: accountKeys.notificationSettings(),
    queryFn: ({ signal }) => apiFetch<NotificationSettings>('/api/account/notifications', { signal }),
  });
}

export function useChangeNotificationSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NotificationSettings) =>
      apiFetch<NotificationSettings>('/api/account/notifications', { method: 'PATCH', body }),
    onSuccess: (saved) => queryClient.setQueryData(accountKeys.notificationSettings(), saved),
  });
}
