import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ScenarioView } from '../../../../shared/api/scenarios';
import type { StrategyView } from '../../../../shared/api/strategies';
import type {
  SweepAnalysis,
  SweepBody,
  SweepParametersView,
  SweepPointsPage,
  SweepPreview,
  SweepView,
} from '../../../../shared/api/sweeps';
import type { OutcomeKind } from '../../../../shared/sweeps/outcomes';
import { apiFetch } from '../../shared/lib/apiFetch';

/*
 * Sweeps of one workspace, under one key per workspace so a launch, pause or cancel
 * refreshes every list and view of it. Progress comes from the server each poll, so a
 * reload in the middle of a sweep shows where it stands.
 */
export const sweepKeys = {
  all: (ws: string) => ['sweeps', ws] as const,
  list: (ws: string) => [...sweepKeys.all(ws), 'list'] as const,
  detail: (ws: string, id: string) => [...sweepKeys.all(ws), 'detail', id] as const,
  points: (ws: string, id: string, query: PointsQuery) =>
    [...sweepKeys.detail(ws, id), 'points', query] as const,
  analysis: (ws: string, id: string, outcome: OutcomeKind) =>
    [...sweepKeys.detail(ws, id), 'analysis', outcome] as const,
  /** The scenarios and strategies a sweep can start from. */
  choices: (ws: string) => [...sweepKeys.all(ws), 'choices'] as const,
  parameters: (ws: string, scenarioId: string, strategyId: string) =>
    [...sweepKeys.all(ws), 'parameters', scenarioId, strategyId] as const,
  preview: (ws: string, body: SweepBody | null) => [...sweepKeys.all(ws), 'preview', body] as const,
};

export type PointsQuery = {
  page: number;
  pageSize: number;
  sort: string;
  order: 'asc' | 'desc';
  filter: 'all' | 'failed';
};

const base = (ws: string) => `/api/workspaces/${encodeURIComponent(ws)}/sweeps`;

/** Progress is polled once a second while a sweep is queued or running (common UI practice). */
const POLL_MS = 1000;

export const isActive = (s: Pick<SweepView, 'status'>) => s.status === 'queued' || s.status === 'running';

export function useSweeps(ws: string) {
  return useQuery({
    queryKey: sweepKeys.list(ws),
    queryFn: ({ signal }) => apiFetch<SweepView[]>(base(ws), { signal }),
    refetchInterval: (query) => (query.state.data?.some(isActive) ? POLL_MS : false),
  });
}

export function useSweep(ws: string, id: string) {
  return useQuery({
    queryKey: sweepKeys.detail(ws, id),
    queryFn: ({ signal }) => apiFetch<SweepView>(`${base(ws)}/${encodeURIComponent(id)}`, { signal }),
    refetchInterval: (query) => (query.state.data && isActive(query.state.data) ? POLL_MS : false),
  });
}

export type SweepChoices = { scenarios: ScenarioView[]; strategies: StrategyView[] };

export function useSweepChoices(ws: string) {
  return useQuery({
    queryKey: sweepKeys.choices(ws),
    queryFn: async ({ signal }): Promise<SweepChoices> => {
      const root = `/api/workspaces/${encodeURIComponent(ws)}`;
      const [scenarios, strategies] = await Promise.all([
        apiFetch<ScenarioView[]>(`${root}/scenarios`, { signal }),
        apiFetch<StrategyView[]>(`${root}/strategies`, { signal }),
      ]);
      return { scenarios, strategies };
    },
  });
}

export function useSweepParameters(ws: string, scenarioId: string, strategyId: string) {
  return useQuery({
    queryKey: sweepKeys.parameters(ws, scenarioId, strategyId),
    queryFn: ({ signal }) => {
      const query = new URLSearchParams({ scenarioId, strategyId });
      return apiFetch<SweepParametersView>(`${base(ws)}/parameters?${query}`, { signal });
    },
    enabled: scenarioId !== '' && strategyId !== '',
  });
}

/** The size and time estimate of a definition, re-asked as it changes; a 400 says what is wrong. */
export function useSweepPreview(ws: string, body: SweepBody | null) {
  return useQuery({
    queryKey: sweepKeys.preview(ws, body),
    queryFn: ({ signal }) => apiFetch<SweepPreview>(`${base(ws)}/preview`, { method: 'POST', body, signal }),
    enabled: body !== null,
    retry: false,
    placeholderData: keepPreviousData,
  });
}

export function useLaunchSweep(ws: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SweepBody) => apiFetch<SweepView>(base(ws), { method: 'POST', body }),
    onSuccess: (view) => {
      queryClient.setQueryData(sweepKeys.detail(ws, view.id), view);
      void queryClient.invalidateQueries({ queryKey: sweepKeys.list(ws) });
    },
  });
}

export function useControlSweep(ws: string, id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (action: 'pause' | 'resume' | 'cancel') =>
      apiFetch<SweepView>(`${base(ws)}/${encodeURIComponent(id)}/${action}`, { method: 'POST' }),
    onSuccess: (view) => {
      queryClient.setQueryData(sweepKeys.detail(ws, id), view);
      void queryClient.invalidateQueries({ queryKey: sweepKeys.list(ws) });
    },
  });
}

/**
 * A page of finished points. `revision` (the points done) is part of nothing but the
 * refetch: while the sweep runs, the page is asked again whenever more points are in.
 */
export function useSweepPoints(ws: string, id: string, query: PointsQuery, revision: number) {
  return useQuery({
    queryKey: [...sweepKeys.points(ws, id, query), revision],
    queryFn: ({ signal }) => {
      const q = new URLSearchParams({
        page: String(query.page),
        pageSize: String(query.pageSize),
        sort: query.sort,
        order: query.order,
        filter: query.filter,
      });
      return apiFetch<SweepPointsPage>(`${base(ws)}/${encodeURIComponent(id)}/points?${q}`, { signal });
    },
    placeholderData: keepPreviousData,
  });
}

export function useSweepAnalysis(ws: string, id: string, outcome: OutcomeKind, revision: number) {
  return useQuery({
    queryKey: [...sweepKeys.analysis(ws, id, outcome), revision],
    queryFn: ({ signal }) =>
      apiFetch<SweepAnalysis>(`${base(ws)}/${encodeURIComponent(id)}/analysis?outcome=${outcome}`, {
        signal,
      }),
    placeholderData: keepPreviousData,
  });
}

export const downloadUrl = (ws: string, id: string, kind: 'csv' | 'json') =>
  `${base(ws)}/${encodeURIComponent(id)}/results.${kind}`;
