import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AcceptedInvitation, InvitationLookup } from '../../../../shared/api/invitations';
import { apiFetch } from '../../shared/lib/apiFetch';

export const invitationKeys = {
  all: ['invitations'] as const,
  lookup: (token: string) => [...invitationKeys.all, token] as const,
};

const path = (token: string) => `/api/invitations/${encodeURIComponent(token)}`;

/** What the link offers and whether it still works; an unknown link is a 404. */
export function useInvitationLookup(token: string) {
  return useQuery({
    queryKey: invitationKeys.lookup(token),
    queryFn: ({ signal }) => apiFetch<InvitationLookup>(path(token), { signal }),
  });
}

/*
 * Joining adds a workspace to lists other features cache (the session, the workspace
 * switcher), which this feature cannot name without importing them, so everything cached
 * is marked stale and refetched as it is shown.
 */
export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<AcceptedInvitation>(`${path(token)}/accept`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
