import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  AdoptBody,
  AdoptionView,
  FieldEstimates,
  PreviewReport,
  UploadView,
} from '../../../../shared/api/records';
import type { RecordKind } from '../../../../shared/records/columns';
import { apiFetch } from '../../shared/lib/apiFetch';

export const recordKeys = {
  all: (workspaceId: string, fieldId: string) => ['records', workspaceId, fieldId] as const,
  uploads: (workspaceId: string, fieldId: string) =>
    [...recordKeys.all(workspaceId, fieldId), 'uploads'] as const,
  estimates: (workspaceId: string, fieldId: string) =>
    [...recordKeys.all(workspaceId, fieldId), 'estimates'] as const,
  adoptions: (workspaceId: string, fieldId: string) =>
    [...recordKeys.all(workspaceId, fieldId), 'adoptions'] as const,
};

const recordsPath = (workspaceId: string, fieldId: string) =>
  `/api/workspaces/${encodeURIComponent(workspaceId)}/fields/${encodeURIComponent(fieldId)}/records`;

/** Where the browser downloads a template or an original file (a plain link: the session cookie rides along). */
export const templateUrl = (kind: RecordKind) => `/api/records/templates/${kind}`;
export const originalUrl = (workspaceId: string, fieldId: string, uploadId: string) =>
  `${recordsPath(workspaceId, fieldId)}/uploads/${encodeURIComponent(uploadId)}/file`;

export function useUploads(workspaceId: string, fieldId: string) {
  return useQuery({
    queryKey: recordKeys.uploads(workspaceId, fieldId),
    queryFn: ({ signal }) =>
      apiFetch<UploadView[]>(`${recordsPath(workspaceId, fieldId)}/uploads`, { signal }),
  });
}

export function useEstimates(workspaceId: string, fieldId: string) {
  return useQuery({
    queryKey: recordKeys.estimates(workspaceId, fieldId),
    queryFn: ({ signal }) =>
      apiFetch<FieldEstimates>(`${recordsPath(workspaceId, fieldId)}/estimates`, { signal }),
  });
}

export function useAdoptions(workspaceId: string, fieldId: string) {
  return useQuery({
    queryKey: recordKeys.adoptions(workspaceId, fieldId),
    queryFn: ({ signal }) =>
      apiFetch<AdoptionView[]>(`${recordsPath(workspaceId, fieldId)}/adoptions`, { signal }),
  });
}

export type UploadInput = { file: File; kind: RecordKind; check: string };

function form({ file, kind, check }: UploadInput): FormData {
  const data = new FormData();
  data.append('kind', kind);
  if (kind === 'efficacy-trials' && check.trim() !== '') data.append('check', check.trim());
  data.append('file', file);
  return data;
}

/** Parses and checks a file on the server; nothing is saved. */
export function usePreview(workspaceId: string, fieldId: string) {
  return useMutation({
    mutationFn: (input: UploadInput) =>
      apiFetch<PreviewReport>(`${recordsPath(workspaceId, fieldId)}/preview`, {
        method: 'POST',
        body: form(input),
      }),
  });
}

/** After an import, a removal or an adoption the field's lists and estimates are read again. */
function useRefreshRecords(workspaceId: string, fieldId: string) {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: recordKeys.all(workspaceId, fieldId) });
}

export function useImport(workspaceId: string, fieldId: string) {
  const refresh = useRefreshRecords(workspaceId, fieldId);
  return useMutation({
    mutationFn: (input: UploadInput) =>
      apiFetch<UploadView>(`${recordsPath(workspaceId, fieldId)}/uploads`, {
        method: 'POST',
        body: form(input),
      }),
    onSuccess: refresh,
  });
}

export function useRemoveUpload(workspaceId: string, fieldId: string) {
  const refresh = useRefreshRecords(workspaceId, fieldId);
  return useMutation({
    mutationFn: (uploadId: string) =>
      apiFetch<void>(`${recordsPath(workspaceId, fieldId)}/uploads/${encodeURIComponent(uploadId)}`, {
        method: 'DELETE',
      }),
    onSuccess: refresh,
  });
}

export function useAdopt(workspaceId: string, fieldId: string) {
  const refresh = useRefreshRecords(workspaceId, fieldId);
  return useMutation({
    mutationFn: (body: AdoptBody) =>
      apiFetch<AdoptionView>(`${recordsPath(workspaceId, fieldId)}/adoptions`, { method: 'POST', body }),
    onSuccess: refresh,
  });
}
