import { useQueryClient } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { fieldKeys, useField } from '../features/fields/api';
import { profileKeys, useCopyProfile, useProfiles } from '../features/profiles/api';
import { RecordsPage } from '../features/records/RecordsPage';
import { strategyKeys, useStrategies } from '../features/strategies/api';
import { NotFoundNotice } from '../shared/components/NotFoundNotice';
import { ErrorNotice, LoadingNotice } from '../shared/components/Notice';
import { ApiRequestError } from '../shared/lib/apiFetch';
import { useCurrentWorkspace } from '../shared/lib/currentWorkspace';

/*
 * A field's records page needs the field (its name and initial seedbank), the workspace's
 * species profiles and strategies (where an estimate can go) and, after an adoption, the
 * caches of whichever of them changed. Those belong to three features, so they meet here.
 */
export function RecordsRoute() {
  const { fieldId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const field = useField(workspace.id, fieldId);
  const profiles = useProfiles(workspace.id);
  const strategies = useStrategies(workspace.id);
  const copy = useCopyProfile(workspace.id);
  const queryClient = useQueryClient();

  if (field.isPending) return <LoadingNotice>Loading the field…</LoadingNotice>;
  if (field.isError) {
    if (field.error instanceof ApiRequestError && field.error.status === 404)
      return <NotFoundNotice what="field" />;
    return (
      <ErrorNotice
        title="Seedwake could not load this field"
        error={field.error}
        onRetry={() => void field.refetch()}
      />
    );
  }
  return (
    <RecordsPage
      field={{
        id: field.data.id,
        name: field.data.name,
        initialSeedbank: field.data.setting.initialSeedbank,
      }}
      profiles={profiles.data ?? []}
      strategies={strategies.data ?? []}
      copyProfile={(id) => copy.mutateAsync(id)}
      onAdopted={(target) => {
        const key =
          target === 'profile'
            ? profileKeys.all(workspace.id)
            : target === 'step'
              ? strategyKeys.all(workspace.id)
              : fieldKeys.all(workspace.id);
        void queryClient.invalidateQueries({ queryKey: key });
      }}
    />
  );
}
