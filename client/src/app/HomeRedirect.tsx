import { Navigate } from 'react-router-dom';
import { useWorkspaces } from '../features/workspaces/api';
import { CreateWorkspaceForm } from '../features/workspaces/CreateWorkspaceForm';
import { ErrorNotice, LoadingNotice } from '../shared/components/Notice';
import { PageTitle, Panel } from '../shared/components/Panel';

/** "/" opens the first workspace; someone who belongs to none is offered a new one. */
export function HomeRedirect() {
  const workspaces = useWorkspaces();
  if (workspaces.isPending) return <LoadingNotice>Opening your workspace…</LoadingNotice>;
  if (workspaces.isError) {
    return (
      <ErrorNotice
        title="Seedwake could not load your workspaces"
        error={workspaces.error}
        onRetry={() => void workspaces.refetch()}
      />
    );
  }
  const first = workspaces.data[0];
  if (first) return <Navigate to={`/w/${first.id}`} replace />;
  return (
    <div className="flex max-w-xl flex-col gap-6">
      <PageTitle
        title="No workspace yet"
        lead="You are not a member of any workspace. Start one of your own, or ask an owner to add you to theirs."
      />
      <Panel>
        <CreateWorkspaceForm />
      </Panel>
    </div>
  );
}
