import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { StrategyBody, StrategyView } from '../../../../shared/api/strategies';
import { apiFetch } from '../../shared/lib/apiFetch';

export const strategyKeys = {
  all: (workspaceId: string) => ['strategies', workspaceId] as const,
  list: (workspaceId: string) => [...strategyKeys.all(workspaceId), 'list'] as const,
  detail: (workspaceId: string, strategyId: string) =>
    [...strategyKeys.all(workspaceId), 'detail', strategyId] as const,
};

const strategiesPath = (workspaceId: string) =>
  `/api/workspaces/${encodeURIComponent(workspaceId)}/strategies`;
const strategyPath = (workspaceId: string, strategyId: string) =>
  `${strategiesPath(workspaceId)}/${encodeURIComponent(strategyId)}`;

export function useStrategies(workspaceId: string) {
  return useQuery({
    queryKey: strategyKeys.list(workspaceId),
    queryFn: ({ signal }) => apiFetch<StrategyView[]>(strategiesPath(workspaceId), { signal }),
  });
}

export function useStrategy(workspaceId: string, strategyId: string) {
  return useQuery({
    queryKey: strategyKeys.detail(workspaceId, strategyId),
    queryFn: ({ signal }) => apiFetch<StrategyView>(strategyPath(workspaceId, strategyId), { signal }),
  });
}

/**
 * A saved strategy, with the rate warnings the server worked out for it, is put in the
 * cache at once, so its page shows it without a second request.
 */
function useStoreStrategy(workspaceId: string) {
  const queryClient = useQueryClient();
  return (saved: StrategyView) => {
    queryClient.setQueryData(strategyKeys.detail(workspaceId, saved.id), saved);
    void queryClient.invalidateQueries({ queryKey: strategyKeys.list(workspaceId) });
  };
}

export function useCreateStrategy(workspaceId: string) {
  const store = useStoreStrategy(workspaceId);
  return useMutation({
    mutationFn: (body: StrategyBody) =>
      apiFetch<StrategyView>(strategiesPath(workspaceId), { method: 'POST', body }),
    onSuccess: store,
  });
}

export function useUpdateStrategy(workspaceId: string, strategyId: string) {
  const store = useStoreStrategy(workspaceId);
  return useMutation({
    mutationFn: (body: StrategyBody) =>
      apiFetch<StrategyView>(strategyPath(workspaceId, strategyId), { method: 'PUT', body }),
    onSuccess: store,
  });
}

export function useDeleteStrategy(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (strategyId: string) =>
      apiFetch<void>(strategyPath(workspaceId, strategyId), { method: 'DELETE' }),
    onSuccess: (_data, strategyId) => {
      queryClient.removeQueries({ queryKey: strategyKeys.detail(workspaceId, strategyId) });
      return queryClient.invalidateQueries({ queryKey: strategyKeys.list(workspaceId) });
    },
  });
}
