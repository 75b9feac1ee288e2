import { useQuery } from '@tanstack/react-query';
import type { OutboxMessage } from '../../../../shared/api/mail';
import { apiFetch } from '../../shared/lib/apiFetch';

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
};

/** What the development mail fake received; 404 in production, where there is none. */
export function useOutbox() {
  return useQuery({
    queryKey: outboxKeys.list(),
    queryFn: ({ signal }) => apiFetch<OutboxMessage[]>('/api/dev/outbox', { signal }),
    refetchInterval: 5_000,
  });
}
