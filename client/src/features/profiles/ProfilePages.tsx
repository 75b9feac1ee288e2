import { useNavigate, useParams } from 'react-router-dom';
import { BackLink } from '../../shared/components/BackLink';
import { Button } from '../../shared/components/Button';
import { ConfirmDelete } from '../../shared/components/ConfirmDelete';
import { LoadFailure } from '../../shared/components/LoadFailure';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useCopyProfile, useCreateProfile, useDeleteProfile, useProfile, useUpdateProfile } from './api';
import { ProfileEditor } from './ProfileEditor';
import { defaultProfile, draftFromProfile } from './profileDraft';

/** /w/:workspaceId/profiles/new — a profile started from the catalogue's defaults. */
export function NewProfilePage() {
  const workspace = useCurrentWorkspace();
  const create = useCreateProfile(workspace.id);
  const navigate = useNavigate();
  if (workspace.role === 'viewer') return <NotFoundNotice what="page" />;
  return (
    <div className="flex flex-col gap-6">
      <title>New species profile · Seedwake</title>
      <BackLink to={`/w/${workspace.id}/profiles`}>← All species profiles</BackLink>
      <PageTitle
        eyebrow="Species profile"
        title="New species profile"
        lead="Every value starts at the catalogue’s default, with its source beside it. Replace them with your own numbers and note where each came from."
      />
      <ProfileEditor
        initial={draftFromProfile(defaultProfile(), {})}
        editable
        saving={create.isPending}
        saveError={create.error}
        onSave={(body) =>
          create.mutateAsync(body).then((saved) => {
            void navigate(`/w/${workspace.id}/profiles/${saved.id}`, { replace: true });
            return saved;
          })
        }
      />
    </div>
  );
}

/** /w/:workspaceId/profiles/:profileId — read-only for viewers and for built-in profiles. */
export function ProfilePage() {
  const { profileId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const query = useProfile(workspace.id, profileId);
  const update = useUpdateProfile(workspace.id, profileId);
  const copy = useCopyProfile(workspace.id);
  const remove = useDeleteProfile(workspace.id);
  const navigate = useNavigate();

  if (query.isPending) return <LoadingNotice>Loading the species profile…</LoadingNotice>;
  if (query.isError)
    return <LoadFailure error={query.error} what="species profile" onRetry={() => void query.refetch()} />;

  const view = query.data;
  const canEdit = workspace.role !== 'viewer';
  const editable = canEdit && !view.builtIn;
  const copyToEdit = () =>
    copy.mutate(view.id, {
      onSuccess: (copied) => void navigate(`/w/${workspace.id}/profiles/${copied.id}`),
    });

  return (
    <div className="flex flex-col gap-6">
      <title>{`${view.name} · Seedwake`}</title>
      <BackLink to={`/w/${workspace.id}/profiles`}>← All species profiles</BackLink>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <PageTitle
          eyebrow={view.builtIn ? 'Species profile · built in' : 'Species profile'}
          title={view.name}
          lead={
            view.builtIn
              ? 'An invented, illustrative profile shared by every workspace. It is read-only: copy it to change its values and record your own sources.'
              : canEdit
                ? 'Change any value and the decay preview follows as you type. Note where each value came from in the box under it.'
                : 'You can read this profile and its sources; editors in the workspace can change it.'
          }
        />
        {view.builtIn ? (
          <div className="flex flex-col items-start gap-2">
            <span className="rounded-sm bg-clay-100 px-2 py-0.5 text-xs font-semibold tracking-wide text-clay-800 uppercase">
              Illustrative
            </span>
            {canEdit ? (
              <Button onClick={copyToEdit} pending={copy.isPending} pendingLabel="Copying…">
                Copy to edit
              </Button>
            ) : null}
          </div>
        ) : null}
      </div>
      {copy.error ? (
        <p role="alert" className="text-sm font-medium text-danger-700">
          {copy.error.message}
        </p>
      ) : null}
      <ProfileEditor
        key={view.id}
        initial={draftFromProfile(view.profile, view.sources)}
        editable={editable}
        saving={update.isPending}
        saveError={update.error}
        onSave={(body) => update.mutateAsync(body)}
        actions={
          editable ? (
            <ConfirmDelete
              what="profile"
              name={view.name}
              pending={remove.isPending}
              error={remove.error}
              onConfirm={() =>
                remove.mutate(view.id, {
                  onSuccess: () => void navigate(`/w/${workspace.id}/profiles`, { replace: true }),
                })
              }
            />
          ) : undefined
        }
      />
    </div>
  );
}
