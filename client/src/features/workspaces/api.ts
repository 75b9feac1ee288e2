import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  AddMemberBody,
  ChangeRoleBody,
  CreateWorkspaceBody,
  MemberView,
  WorkspaceView,
} from '../../../../shared/api/workspaces';
import type { CreateInvitationBody, InvitationView } from '../../../../shared/api/invitations';
import { apiFetch } from '../../shared/lib/apiFetch';

export const workspaceKeys = {
  all: ['workspaces'] as const,
  list: () => [...workspaceKeys.all, 'list'] as const,
  members: (workspaceId: string) => [...workspaceKeys.all, workspaceId, 'members'] as const,
  invitations: (workspaceId: string) => [...workspaceKeys.all, workspaceId, 'invitations'] as const,
};

const membersPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/members`;

/** Every workspace the signed-in person belongs to, with their role in each. */
export function useWorkspaces() {
  return useQuery({
    queryKey: workspaceKeys.list(),
    queryFn: ({ signal }) => apiFetch<WorkspaceView[]>('/api/workspaces', { signal }),
    staleTime: 30_000,
  });
}

export function useCreateWorkspace() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateWorkspaceBody) =>
      apiFetch<WorkspaceView>('/api/workspaces', { method: 'POST', body }),
    onSuccess: (created) => {
      queryClient.setQueryData<WorkspaceView[]>(workspaceKeys.list(), (list) =>
        list ? [...list, created] : [created],
      );
      void queryClient.invalidateQueries({ queryKey: workspaceKeys.list() });
    },
  });
}

export function useMembers(workspaceId: string) {
  return useQuery({
    queryKey: workspaceKeys.members(workspaceId),
    queryFn: ({ signal }) => apiFetch<MemberView[]>(membersPath(workspaceId), { signal }),
  });
}

export function useAddMember(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AddMemberBody) =>
      apiFetch<MemberView>(membersPath(workspaceId), { method: 'POST', body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.members(workspaceId) }),
  });
}

/*
 * A role change or a removal can be the person's own, which changes their role in the
 * workspace list (or drops the workspace from it), so both lists are refreshed.
 */
export function useChangeRole(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string } & ChangeRoleBody) =>
      apiFetch<MemberView>(`${membersPath(workspaceId)}/${encodeURIComponent(userId)}`, {
        method: 'PATCH',
        body: { role },
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.all }),
  });
}

export function useRemoveMember(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) =>
      apiFetch<void>(`${membersPath(workspaceId)}/${encodeURIComponent(userId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.all }),
  });
}

const invitationsPath = (workspaceId: string) =>
  `/api/workspaces/${encodeURIComponent(workspaceId)}/invitations`;

/** Open invitations of the workspace (owners only; the server answers 403 to anyone else). */
export function useInvitations(workspaceId: string) {
  return useQuery({
    queryKey: workspaceKeys.invitations(workspaceId),
    queryFn: ({ signal }) => apiFetch<InvitationView[]>(invitationsPath(workspaceId), { signal }),
  });
}

export function useInvite(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInvitationBody) =>
      apiFetch<InvitationView>(invitationsPath(workspaceId), { method: 'POST', body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.invitations(workspaceId) }),
  });
}

export function useResendInvitation(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) =>
      apiFetch<InvitationView>(`${invitationsPath(workspaceId)}/${encodeURIComponent(invitationId)}/resend`, {
        method: 'POST',
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.invitations(workspaceId) }),
  });
}

export function useRevokeInvitation(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) =>
      apiFetch<void>(`${invitationsPath(workspaceId)}/${encodeURIComponent(invitationId)}`, {
        method: 'DELETE',
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.invitations(workspaceId) }),
  });
}
