import { Link, useNavigate, useParams } from 'react-router-dom';
import { BackLink } from '../../shared/components/BackLink';
import { ConfirmDelete } from '../../shared/components/ConfirmDelete';
import { LoadFailure } from '../../shared/components/LoadFailure';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useCreateField, useDeleteField, useField, useUpdateField } from './api';
import { FieldEditor } from './FieldEditor';
import { draftFromField, newFieldDraft } from './fieldDraft';

/** /w/:workspaceId/fields/new */
export function NewFieldPage() {
  const workspace = useCurrentWorkspace();
  const create = useCreateField(workspace.id);
  const navigate = useNavigate();
  if (workspace.role === 'viewer') return <NotFoundNotice what="page" />;
  return (
    <div className="flex flex-col gap-6">
      <title>New field · Seedwake</title>
      <BackLink to={`/w/${workspace.id}/fields`}>← All fields</BackLink>
      <PageTitle
        eyebrow="Field"
        title="New field"
        lead="Numbers start at the catalogue’s illustrative defaults; replace them with your soil-core and plant counts."
      />
      <FieldEditor
        initial={newFieldDraft()}
        editable
        saving={create.isPending}
        saveError={create.error}
        onSave={(body) =>
          create.mutateAsync(body).then((saved) => {
            void navigate(`/w/${workspace.id}/fields/${saved.id}`, { replace: true });
            return saved;
          })
        }
      />
    </div>
  );
}

/** /w/:workspaceId/fields/:fieldId — read-only for viewers. */
export function FieldPage() {
  const { fieldId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const query = useField(workspace.id, fieldId);
  const update = useUpdateField(workspace.id, fieldId);
  const remove = useDeleteField(workspace.id);
  const navigate = useNavigate();

  if (query.isPending) return <LoadingNotice>Loading the field…</LoadingNotice>;
  if (query.isError)
    return <LoadFailure error={query.error} what="field" onRetry={() => void query.refetch()} />;
  const view = query.data;
  const editable = workspace.role !== 'viewer';

  return (
    <div className="flex flex-col gap-6">
      <title>{`${view.name} · Seedwake`}</title>
      <BackLink to={`/w/${workspace.id}/fields`}>← All fields</BackLink>
      <PageTitle
        eyebrow={
          view.plantingYear ? `Field · ${view.crop}, planted ${view.plantingYear}` : `Field · ${view.crop}`
        }
        title={view.name}
        lead={editable ? undefined : 'You can read this field; editors in the workspace can change it.'}
      />
      <p>
        <Link
          to={`/w/${workspace.id}/fields/${view.id}/records`}
          className="font-medium text-russet-700 underline underline-offset-4"
        >
          Field records: soil cores, plant counts, germination tests and efficacy trials →
        </Link>
      </p>
      <FieldEditor
        key={view.id}
        initial={draftFromField(view)}
        editable={editable}
        saving={update.isPending}
        saveError={update.error}
        onSave={(body) => update.mutateAsync(body)}
        actions={
          editable ? (
            <ConfirmDelete
              what="field"
              name={view.name}
              pending={remove.isPending}
              error={remove.error}
              onConfirm={() =>
                remove.mutate(view.id, {
                  onSuccess: () => void navigate(`/w/${workspace.id}/fields`, { replace: true }),
                })
              }
            />
          ) : undefined
        }
      />
    </div>
  );
}
