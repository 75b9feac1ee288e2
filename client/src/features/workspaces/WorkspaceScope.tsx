import { Outlet, useParams } from 'react-router-dom';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { CurrentWorkspaceContext } from '../../shared/lib/currentWorkspace';
import { useWorkspaces } from './api';

/**
 * The layout route for /w/:workspaceId: finds the workspace among the person's own and
 * provides it to every page below. A workspace they do not belong to reads as not found,
 * the same answer the server gives, so its existence is not revealed.
 */
export function WorkspaceScope() {
  const { workspaceId } = useParams();
  const workspaces = useWorkspaces();

  if (workspaces.isPending) return <LoadingNotice>Opening the workspace…</LoadingNotice>;
  if (workspaces.isError) {
    return (
      <ErrorNotice
        title="Seedwake could not load your workspaces"
        error={workspaces.error}
        onRetry={() => void workspaces.refetch()}
      />
    );
  }
  const workspace = workspaces.data.find((w) => w.id === workspaceId);
  if (!workspace) return <NotFoundNotice what="workspace" />;

  return (
    <CurrentWorkspaceContext value={workspace}>
      <Outlet />
    </CurrentWorkspaceContext>
  );
}
