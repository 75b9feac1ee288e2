import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NotificationList } from '../../../../shared/api/notifications';
import { apiFetch } from '../../shared/lib/apiFetch';

export const notificationKeys = {
  all: ['notifications'] as const,
  list: () => [...notificationKeys.all, 'list'] as const,
};

/** The latest notices; polled, since long projections end while the person works elsewhere. */
export function useNotifications() {
  return useQuery({
    queryKey: notificationKeys.list(),
    queryFn: ({ signal }) => apiFetch<NotificationList>('/api/notifications', { signal }),
    refetchInterval: 30_000,
    staleTime: 10_000,
  });
}

export function useMarkRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<void>(`/api/notifications/${encodeURIComponent(id)}/read`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: notificationKeys.all }),
  });
}
