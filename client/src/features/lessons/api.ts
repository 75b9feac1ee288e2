import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ClassLessonView,
  CreatedClassLink,
  LessonBody,
  LessonListItem,
  LessonView,
  ReplayBody,
  ReplayResponse,
} from '../../../../shared/api/lessons';
import { apiFetch } from '../../shared/lib/apiFetch';

export const lessonKeys = {
  all: (workspaceId: string) => ['lessons', workspaceId] as const,
  list: (workspaceId: string) => [...lessonKeys.all(workspaceId), 'list'] as const,
  detail: (workspaceId: string, lessonId: string) =>
    [...lessonKeys.all(workspaceId), 'detail', lessonId] as const,
  /** A class link's lesson, seen signed out: keyed by the token, not by any workspace. */
  classLesson: (token: string) => ['class-lesson', token] as const,
};

const lessonsPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/lessons`;
const lessonPath = (workspaceId: string, lessonId: string) =>
  `${lessonsPath(workspaceId)}/${encodeURIComponent(lessonId)}`;
const classPath = (token: string) => `/api/class/${encodeURIComponent(token)}`;

export function useLessons(workspaceId: string) {
  return useQuery({
    queryKey: lessonKeys.list(workspaceId),
    queryFn: ({ signal }) => apiFetch<LessonListItem[]>(lessonsPath(workspaceId), { signal }),
  });
}

export function useLesson(workspaceId: string, lessonId: string) {
  return useQuery({
    queryKey: lessonKeys.detail(workspaceId, lessonId),
    queryFn: ({ signal }) => apiFetch<LessonView>(lessonPath(workspaceId, lessonId), { signal }),
  });
}

function useStoreLesson(workspaceId: string) {
  const queryClient = useQueryClient();
  return (saved: LessonView) => {
    queryClient.setQueryData(lessonKeys.detail(workspaceId, saved.id), saved);
    void queryClient.invalidateQueries({ queryKey: lessonKeys.list(workspaceId) });
  };
}

export function useCreateLesson(workspaceId: string) {
  const store = useStoreLesson(workspaceId);
  return useMutation({
    mutationFn: (body: LessonBody) =>
      apiFetch<LessonView>(lessonsPath(workspaceId), { method: 'POST', body }),
    onSuccess: store,
  });
}

export function useUpdateLesson(workspaceId: string, lessonId: string) {
  const store = useStoreLesson(workspaceId);
  return useMutation({
    mutationFn: (body: LessonBody) =>
      apiFetch<LessonView>(lessonPath(workspaceId, lessonId), { method: 'PUT', body }),
    onSuccess: store,
  });
}

export function useDeleteLesson(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (lessonId: string) => apiFetch<void>(lessonPath(workspaceId, lessonId), { method: 'DELETE' }),
    onSuccess: (_data, lessonId) => {
      queryClient.removeQueries({ queryKey: lessonKeys.detail(workspaceId, lessonId) });
      return queryClient.invalidateQueries({ queryKey: lessonKeys.list(workspaceId) });
    },
  });
}

/** Making a link replaces any earlier one; the token comes back once, in this answer only. */
export function useCreateClassLink(workspaceId: string, lessonId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiFetch<CreatedClassLink>(`${lessonPath(workspaceId, lessonId)}/link`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: lessonKeys.all(workspaceId) }),
  });
}

export function useRevokeClassLink(workspaceId: string, lessonId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<void>(`${lessonPath(workspaceId, lessonId)}/link`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: lessonKeys.all(workspaceId) }),
  });
}

export function useClassLesson(token: string) {
  return useQuery({
    queryKey: lessonKeys.classLesson(token),
    queryFn: ({ signal }) => apiFetch<ClassLessonView>(classPath(token), { signal }),
  });
}

/** "Replay with chance" from a signed-in lesson page, or from a class link. */
export function useReplay(target: { workspaceId: string; lessonId: string } | { token: string }) {
  const path =
    'token' in target
      ? `${classPath(target.token)}/replay`
      : `${lessonPath(target.workspaceId, target.lessonId)}/replay`;
  return useMutation({
    mutationFn: (body: ReplayBody) => apiFetch<ReplayResponse>(path, { method: 'POST', body }),
  });
}
