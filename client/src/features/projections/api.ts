import { useEffect } from 'react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { FieldView } from '../../../../shared/api/fields';
import type { ProfileView } from '../../../../shared/api/profiles';
import type { LaunchResponse, ProjectionListItem, ProjectionView } from '../../../../shared/api/projections';
import type { LaunchBody, ScenarioBody, ScenarioView } from '../../../../shared/api/scenarios';
import type { StrategyView } from '../../../../shared/api/strategies';
import type { ShareView, SharedComparison } from '../../../../shared/api/shares';
import type { MemberView } from '../../../../shared/api/workspaces';
import { apiFetch } from '../../shared/lib/apiFetch';

/*
 * Scenarios, their launches and the projections those make. Everything lives under one
 * key per workspace, so a launch or a cancel refreshes every list and view of it at once.
 */
export const projectionKeys = {
  all: (ws: string) => ['projections', ws] as const,
  scenarios: (ws: string) => [...projectionKeys.all(ws), 'scenarios'] as const,
  scenario: (ws: string, id: string) => [...projectionKeys.scenarios(ws), id] as const,
  /** The fields, species profiles and strategies a scenario can be built from. */
  choices: (ws: string) => [...projectionKeys.all(ws), 'choices'] as const,
  recent: (ws: string, scenarioId: string | null) =>
    [...projectionKeys.all(ws), 'recent', scenarioId ?? 'any'] as const,
  detail: (ws: string, id: string) => [...projectionKeys.all(ws), 'detail', id] as const,
  batch: (ws: string, batchId: string) => [...projectionKeys.all(ws), 'batch', batchId] as const,
  shares: (ws: string, batchId: string) => [...projectionKeys.batch(ws, batchId), 'shares'] as const,
  /** Members a comparison can be shared with. */
  audience: (ws: string) => [...projectionKeys.all(ws), 'audience'] as const,
  sharedWithMe: (ws: string) => [...projectionKeys.all(ws), 'shared-with-me'] as const,
};

const base = (ws: string) => `/api/workspaces/${encodeURIComponent(ws)}`;

/** Progress is polled about once a second while anything is still to finish (common UI practice). */
const POLL_MS = 1000;

export const isActive = (p: Pick<ProjectionListItem, 'status'>) =>
  p.status === 'queued' || p.status === 'running';

export function useScenarios(ws: string) {
  return useQuery({
    queryKey: projectionKeys.scenarios(ws),
    queryFn: ({ signal }) => apiFetch<ScenarioView[]>(`${base(ws)}/scenarios`, { signal }),
  });
}

export function useScenario(ws: string, id: string | undefined) {
  return useQuery({
    queryKey: projectionKeys.scenario(ws, id ?? ''),
    queryFn: ({ signal }) =>
      apiFetch<ScenarioView>(`${base(ws)}/scenarios/${encodeURIComponent(id!)}`, { signal }),
    enabled: id !== undefined,
  });
}

export type ScenarioChoices = { fields: FieldView[]; profiles: ProfileView[]; strategies: StrategyView[] };

export function useScenarioChoices(ws: string) {
  return useQuery({
    queryKey: projectionKeys.choices(ws),
    queryFn: async ({ signal }): Promise<ScenarioChoices> => {
      const [fields, profiles, strategies] = await Promise.all([
        apiFetch<FieldView[]>(`${base(ws)}/fields`, { signal }),
        apiFetch<ProfileView[]>(`${base(ws)}/profiles`, { signal }),
        apiFetch<StrategyView[]>(`${base(ws)}/strategies`, { signal }),
      ]);
      return { fields, profiles, strategies };
    },
  });
}

export function useSaveScenario(ws: string, id: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ScenarioBody) =>
      id === undefined
        ? apiFetch<ScenarioView>(`${base(ws)}/scenarios`, { method: 'POST', body })
        : apiFetch<ScenarioView>(`${base(ws)}/scenarios/${encodeURIComponent(id)}`, { method: 'PUT', body }),
    onSuccess: (saved) => {
      queryClient.setQueryData(projectionKeys.scenario(ws, saved.id), saved);
      void queryClient.invalidateQueries({ queryKey: projectionKeys.scenarios(ws) });
    },
  });
}

export function useDeleteScenario(ws: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<void>(`${base(ws)}/scenarios/${encodeURIComponent(id)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectionKeys.scenarios(ws) }),
  });
}

/** POST …/runs: a new batch (every strategy, No control, and a let-it-seed variant when asked). */
export function useLaunch(ws: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ scenarioId, body }: { scenarioId: string; body: LaunchBody }) =>
      apiFetch<LaunchResponse>(`${base(ws)}/scenarios/${encodeURIComponent(scenarioId)}/runs`, {
        method: 'POST',
        body,
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: [...projectionKeys.all(ws), 'recent'] }),
  });
}

/** POST …/batches/:id/rerun: the same launch again from its frozen inputs and seed. */
export function useRerunBatch(ws: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (batchId: string) =>
      apiFetch<LaunchResponse>(`${base(ws)}/batches/${encodeURIComponent(batchId)}/rerun`, {
        method: 'POST',
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: [...projectionKeys.all(ws), 'recent'] }),
  });
}

export function useCancelProjection(ws: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<ProjectionView>(`${base(ws)}/projections/${encodeURIComponent(id)}/cancel`, {
        method: 'POST',
      }),
    onSuccess: (view) => {
      queryClient.setQueryData(projectionKeys.detail(ws, view.id), view);
      void queryClient.invalidateQueries({ queryKey: projectionKeys.batch(ws, view.batchId) });
      void queryClient.invalidateQueries({ queryKey: [...projectionKeys.all(ws), 'recent'] });
    },
  });
}

/** The newest projections of the workspace (or of one scenario), light enough to poll. */
export function useRecentProjections(
  ws: string,
  scenarioId: string | null,
  options: { poll?: boolean } = {},
) {
  return useQuery({
    queryKey: projectionKeys.recent(ws, scenarioId),
    queryFn: ({ signal }) => {
      const query = new URLSearchParams({ limit: '100' });
      if (scenarioId) query.set('scenarioId', scenarioId);
      return apiFetch<ProjectionListItem[]>(`${base(ws)}/projections?${query}`, { signal });
    },
    refetchInterval: (query) => (options.poll && query.state.data?.some(isActive) ? POLL_MS : false),
  });
}

/** One projection with its result; polls itself while it is queued or running. */
export function useProjection(ws: string, id: string) {
  return useQuery({
    queryKey: projectionKeys.detail(ws, id),
    queryFn: ({ signal }) =>
      apiFetch<ProjectionView>(`${base(ws)}/projections/${encodeURIComponent(id)}`, { signal }),
    refetchInterval: (query) => (query.state.data && isActive(query.state.data) ? POLL_MS : false),
  });
}

/**
 * One launch, with every projection's result. While any of it runs, progress comes from
 * the light list of the scenario's projections, polled each second; when one of them
 * finishes, the batch is fetched again for its result. Everything comes from the server,
 * so a reload in the middle of a run picks the progress up where it is.
 */
export function useBatch(ws: string, batchId: string) {
  const queryClient = useQueryClient();
  const batch = useQuery({
    queryKey: projectionKeys.batch(ws, batchId),
    queryFn: ({ signal }) =>
      apiFetch<ProjectionView[]>(`${base(ws)}/batches/${encodeURIComponent(batchId)}`, { signal }),
    // A batch whose scenario was deleted has no list to poll, so it polls itself.
    refetchInterval: (query) => {
      const data = query.state.data;
      return data?.some(isActive) && data[0].scenarioId === null ? POLL_MS : false;
    },
  });
  const views = batch.data;
  const active = views?.some(isActive) ?? false;
  const scenarioId = views?.[0]?.scenarioId ?? null;
  const progress = useQuery({
    queryKey: projectionKeys.recent(ws, scenarioId),
    queryFn: ({ signal }) => {
      const query = new URLSearchParams({ limit: '100', scenarioId: scenarioId! });
      return apiFetch<ProjectionListItem[]>(`${base(ws)}/projections?${query}`, { signal });
    },
    enabled: active && scenarioId !== null,
    refetchInterval: (query) =>
      query.state.data?.some((p) => p.batchId === batchId && isActive(p)) === false ? false : POLL_MS,
  });

  const latest = new Map((progress.data ?? []).filter((p) => p.batchId === batchId).map((p) => [p.id, p]));
  const items: ProjectionListItem[] = (views ?? []).map((v) => ({ ...v, ...(latest.get(v.id) ?? {}) }));
  // Projections the list reports finished but whose result the batch does not hold yet.
  const finishedSince = (views ?? [])
    .filter((v) => isActive(v) && latest.has(v.id) && !isActive(latest.get(v.id)!))
    .map((v) => v.id)
    .join(',');

  useEffect(() => {
    if (finishedSince !== '')
      void queryClient.invalidateQueries({ queryKey: projectionKeys.batch(ws, batchId) });
  }, [finishedSince, queryClient, ws, batchId]);

  return { ...batch, items };
}

/** Who a comparison is shared with (editors). */
export function useShares(ws: string, batchId: string, enabled: boolean) {
  return useQuery({
    queryKey: projectionKeys.shares(ws, batchId),
    queryFn: () => apiFetch<ShareView[]>(`${base(ws)}/batches/${encodeURIComponent(batchId)}/shares`),
    enabled,
  });
}

/** The workspace's viewers: the people a comparison is shared with. */
export function useShareAudience(ws: string, enabled: boolean) {
  return useQuery({
    queryKey: projectionKeys.audience(ws),
    queryFn: async () =>
      (await apiFetch<MemberView[]>(`${base(ws)}/members`)).filter((m) => m.role === 'viewer'),
    enabled,
  });
}

export function useSetShare(ws: string, batchId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, shared }: { userId: string; shared: boolean }) =>
      apiFetch<ShareView[] | void>(
        `${base(ws)}/batches/${encodeURIComponent(batchId)}/shares/${encodeURIComponent(userId)}`,
        {
          method: shared ? 'PUT' : 'DELETE',
        },
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectionKeys.shares(ws, batchId) }),
  });
}

/** Comparisons shared with the signed-in viewer, for their home page. */
export function useSharedWithMe(ws: string, enabled: boolean) {
  return useQuery({
    queryKey: projectionKeys.sharedWithMe(ws),
    queryFn: () => apiFetch<SharedComparison[]>(`${base(ws)}/shared-with-me`),
    enabled,
  });
}
