import { useState } from 'react';
import { Button } from '../../shared/components/Button';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { SpeciesCard } from '../../shared/components/SpeciesCard';
import { cardPath, useDeleteCard, useDeletePhoto, useSaveCard, useSpeciesCard } from './api';
import { CardEditor } from './CardEditor';
import { PhotoUpload } from './PhotoUpload';

type SpeciesCardSectionProps = {
  workspaceId: string;
  profileId: string;
  profileName: string;
  canEdit: boolean;
};

/** The species card under a profile: read by everyone in the workspace, written by editors. */
export function SpeciesCardSection({
  workspaceId,
  profileId,
  profileName,
  canEdit,
}: SpeciesCardSectionProps) {
  const card = useSpeciesCard(workspaceId, profileId);
  const save = useSaveCard(workspaceId, profileId);
  const remove = useDeleteCard(workspaceId, profileId);
  const removePhoto = useDeletePhoto(workspaceId, profileId);
  const [editing, setEditing] = useState(false);

  if (card.isPending) return <LoadingNotice>Loading the species card…</LoadingNotice>;
  if (card.isError)
    return (
      <ErrorNotice
        title="Seedwake could not load the species card"
        error={card.error}
        onRetry={() => void card.refetch()}
      />
    );

  const view = card.data;
  const photoUrl = (id: string) => `${cardPath(workspaceId, profileId)}/photos/${encodeURIComponent(id)}`;

  if (editing) {
    return (
      <section
        aria-labelledby="card-editor-title"
        className="flex flex-col gap-4 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
      >
        <h2 id="card-editor-title" className="text-2xl font-semibold">
          Species card: {profileName}
        </h2>
        <CardEditor
          profileName={profileName}
          initial={view}
          saving={save.isPending}
          error={save.error}
          onCancel={() => setEditing(false)}
          onSave={(body) => save.mutate(body, { onSuccess: () => setEditing(false) })}
        />
      </section>
    );
  }

  if (!view) {
    return (
      <section
        aria-labelledby="no-card-title"
        className="flex flex-col items-start gap-2 rounded-seed border border-dashed border-loam-400 p-5"
      >
        <h2 id="no-card-title" className="text-xl font-semibold">
          Species card
        </h2>
        <p className="text-loam-700">
          No species card for {profileName} in this workspace yet
          {canEdit ? ': write how to tell it from its look-alikes, its life form and status.' : '.'}
        </p>
        {canEdit ? <Button onClick={() => setEditing(true)}>Write a species card</Button> : null}
      </section>
    );
  }

  return (
    <div className="flex flex-col gap-3">
      <SpeciesCard name={profileName} card={view} photoUrl={photoUrl} />
      {canEdit ? (
        <div className="flex flex-col gap-3 print:hidden">
          <div className="flex flex-wrap gap-2">
            <Button variant="secondary" onClick={() => setEditing(true)}>
              Edit the card
            </Button>
            <Button variant="quiet" pending={remove.isPending} onClick={() => remove.mutate()}>
              Delete the card
            </Button>
          </div>
          {view.photos.length > 0 ? (
            <ul className="flex flex-wrap gap-2">
              {view.photos.map((p) => (
                <li key={p.id}>
                  <Button
                    variant="quiet"
                    size="sm"
                    pending={removePhoto.isPending && removePhoto.variables === p.id}
                    onClick={() => removePhoto.mutate(p.id)}
                  >
                    Remove photo “{p.caption}”
                  </Button>
                </li>
              ))}
            </ul>
          ) : null}
          <PhotoUpload workspaceId={workspaceId} profileId={profileId} />
        </div>
      ) : null}
    </div>
  );
}
