import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SpeciesCardBody, SpeciesCardView } from '../../../../shared/api/species-cards';
import { ApiRequestError, apiFetch } from '../../shared/lib/apiFetch';

export const cardKeys = {
  all: (workspaceId: string) => ['species-cards', workspaceId] as const,
  detail: (workspaceId: string, profileId: string) => [...cardKeys.all(workspaceId), profileId] as const,
};

export const cardPath = (workspaceId: string, profileId: string) =>
  `/api/workspaces/${encodeURIComponent(workspaceId)}/profiles/${encodeURIComponent(profileId)}/card`;

/** The profile's card in this workspace, or null when none has been written yet. */
export function useSpeciesCard(workspaceId: string, profileId: string) {
  return useQuery({
    queryKey: cardKeys.detail(workspaceId, profileId),
    queryFn: async ({ signal }) => {
      try {
        return await apiFetch<SpeciesCardView>(cardPath(workspaceId, profileId), { signal });
      } catch (error) {
        if (error instanceof ApiRequestError && error.status === 404) return null;
        throw error;
      }
    },
  });
}

function useStoreCard(workspaceId: string, profileId: string) {
  const queryClient = useQueryClient();
  return (card: SpeciesCardView | null) =>
    queryClient.setQueryData(cardKeys.detail(workspaceId, profileId), card);
}

export function useSaveCard(workspaceId: string, profileId: string) {
  const store = useStoreCard(workspaceId, profileId);
  return useMutation({
    mutationFn: (body: SpeciesCardBody) =>
      apiFetch<SpeciesCardView>(cardPath(workspaceId, profileId), { method: 'PUT', body }),
    onSuccess: store,
  });
}

export function useDeleteCard(workspaceId: string, profileId: string) {
  const store = useStoreCard(workspaceId, profileId);
  return useMutation({
    mutationFn: () => apiFetch<void>(cardPath(workspaceId, profileId), { method: 'DELETE' }),
    onSuccess: () => store(null),
  });
}

/** A photo goes up as multipart form data; the server checks, resizes and strips it. */
export function useUploadPhoto(workspaceId: string, profileId: string) {
  const store = useStoreCard(workspaceId, profileId);
  return useMutation({
    mutationFn: ({ file, caption }: { file: File; caption: string }) => {
      const form = new FormData();
      form.append('caption', caption);
      form.append('photo', file);
      return apiFetch<SpeciesCardView>(`${cardPath(workspaceId, profileId)}/photos`, {
        method: 'POST',
        body: form,
      });
    },
    onSuccess: store,
  });
}

export function useDeletePhoto(workspaceId: string, profileId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) =>
      apiFetch<void>(`${cardPath(workspaceId, profileId)}/photos/${encodeURIComponent(photoId)}`, {
        method: 'DELETE',
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cardKeys.detail(workspaceId, profileId) }),
  });
}
