import { createContext, useContext } from 'react';
import type { WorkspaceView } from '../../../../shared/api/workspaces';

/*
 * The workspace named in the address (/w/:workspaceId), with the person's role in it.
 * The workspaces feature resolves it once; other features read it from here so they do
 * not import the workspaces feature.
 */
export const CurrentWorkspaceContext = createContext<WorkspaceView | null>(null);

export function useCurrentWorkspace(): WorkspaceView {
  const workspace = useContext(CurrentWorkspaceContext);
  if (workspace === null) throw new Error('useCurrentWorkspace must be used below /w/:workspaceId');
  return workspace;
}
