import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { FieldBody, FieldView } from '../../../../shared/api/fields';
import { apiFetch } from '../../shared/lib/apiFetch';

export const fieldKeys = {
  all: (workspaceId: string) => ['fields', workspaceId] as const,
  list: (workspaceId: string) => [...fieldKeys.all(workspaceId), 'list'] as const,
  detail: (workspaceId: string, fieldId: string) =>
    [...fieldKeys.all(workspaceId), 'detail', fieldId] as const,
};

const fieldsPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/fields`;
const fieldPath = (workspaceId: string, fieldId: string) =>
  `${fieldsPath(workspaceId)}/${encodeURIComponent(fieldId)}`;

export function useFields(workspaceId: string) {
  return useQuery({
    queryKey: fieldKeys.list(workspaceId),
    queryFn: ({ signal }) => apiFetch<FieldView[]>(fieldsPath(workspaceId), { signal }),
  });
}

export function useField(workspaceId: string, fieldId: string) {
  return useQuery({
    queryKey: fieldKeys.detail(workspaceId, fieldId),
    queryFn: ({ signal }) => apiFetch<FieldView>(fieldPath(workspaceId, fieldId), { signal }),
  });
}

/** A saved field is put in the cache at once, so its page shows it without a second request. */
function useStoreField(workspaceId: string) {
  const queryClient = useQueryClient();
  return (saved: FieldView) => {
    queryClient.setQueryData(fieldKeys.detail(workspaceId, saved.id), saved);
    void queryClient.invalidateQueries({ queryKey: fieldKeys.list(workspaceId) });
  };
}

export function useCreateField(workspaceId: string) {
  const store = useStoreField(workspaceId);
  return useMutation({
    mutationFn: (body: FieldBody) => apiFetch<FieldView>(fieldsPath(workspaceId), { method: 'POST', body }),
    onSuccess: store,
  });
}

export function useUpdateField(workspaceId: string, fieldId: string) {
  const store = useStoreField(workspaceId);
  return useMutation({
    mutationFn: (body: FieldBody) =>
      apiFetch<FieldView>(fieldPath(workspaceId, fieldId), { method: 'PUT', body }),
    onSuccess: store,
  });
}

export function useDeleteField(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fieldId: string) => apiFetch<void>(fieldPath(workspaceId, fieldId), { method: 'DELETE' }),
    onSuccess: (_data, fieldId) => {
      queryClient.removeQueries({ queryKey: fieldKeys.detail(workspaceId, fieldId) });
      return queryClient.invalidateQueries({ queryKey: fieldKeys.list(workspaceId) });
    },
  });
}
