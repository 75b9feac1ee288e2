import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ProfileBody, ProfileView } from '../../../../shared/api/profiles';
import { apiFetch } from '../../shared/lib/apiFetch';

export const profileKeys = {
  all: (workspaceId: string) => ['profiles', workspaceId] as const,
  list: (workspaceId: string) => [...profileKeys.all(workspaceId), 'list'] as const,
  detail: (workspaceId: string, profileId: string) =>
    [...profileKeys.all(workspaceId), 'detail', profileId] as const,
};

const profilesPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/profiles`;
const profilePath = (workspaceId: string, profileId: string) =>
  `${profilesPath(workspaceId)}/${encodeURIComponent(profileId)}`;

/** Built-in illustrative profiles first, as the server lists them, then the workspace's own. */
export function useProfiles(workspaceId: string) {
  return useQuery({
    queryKey: profileKeys.list(workspaceId),
    queryFn: ({ signal }) => apiFetch<ProfileView[]>(profilesPath(workspaceId), { signal }),
  });
}

export function useProfile(workspaceId: string, profileId: string) {
  return useQuery({
    queryKey: profileKeys.detail(workspaceId, profileId),
    queryFn: ({ signal }) => apiFetch<ProfileView>(profilePath(workspaceId, profileId), { signal }),
  });
}

/** A saved profile is put in the cache at once, so its page shows it without a second request. */
function useStoreProfile(workspaceId: string) {
  const queryClient = useQueryClient();
  return (saved: ProfileView) => {
    queryClient.setQueryData(profileKeys.detail(workspaceId, saved.id), saved);
    void queryClient.invalidateQueries({ queryKey: profileKeys.list(workspaceId) });
  };
}

export function useCreateProfile(workspaceId: string) {
  const store = useStoreProfile(workspaceId);
  return useMutation({
    mutationFn: (body: ProfileBody) =>
      apiFetch<ProfileView>(profilesPath(workspaceId), { method: 'POST', body }),
    onSuccess: store,
  });
}

export function useUpdateProfile(workspaceId: string, profileId: string) {
  const store = useStoreProfile(workspaceId);
  return useMutation({
    mutationFn: (body: ProfileBody) =>
      apiFetch<ProfileView>(profilePath(workspaceId, profileId), { method: 'PUT', body }),
    onSuccess: store,
  });
}

/** Copy-to-edit: built-in profiles are read-only, so a person changes their own copy. */
export function useCopyProfile(workspaceId: string) {
  const store = useStoreProfile(workspaceId);
  return useMutation({
    mutationFn: (profileId: string) =>
      apiFetch<ProfileView>(`${profilePath(workspaceId, profileId)}/copy`, { method: 'POST' }),
    onSuccess: store,
  });
}

export function useDeleteProfile(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (profileId: string) =>
      apiFetch<void>(profilePath(workspaceId, profileId), { method: 'DELETE' }),
    onSuccess: (_data, profileId) => {
      queryClient.removeQueries({ queryKey: profileKeys.detail(workspaceId, profileId) });
      return queryClient.invalidateQueries({ queryKey: profileKeys.list(workspaceId) });
    },
  });
}
