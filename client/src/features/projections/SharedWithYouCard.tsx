import { Link } from 'react-router-dom';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useSharedWithMe } from './api';

/** A viewer's home: the comparisons shared with them, and nothing else of the workspace. */
export function SharedWithYouCard() {
  const workspace = useCurrentWorkspace();
  const shared = useSharedWithMe(workspace.id, workspace.role === 'viewer');
  if (workspace.role !== 'viewer') return null;
  return (
    <section
      aria-labelledby="shared-title"
      className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <h2 id="shared-title" className="text-2xl font-semibold">
        Shared with you
      </h2>
      {shared.isPending ? (
        <LoadingNotice>Loading what was shared…</LoadingNotice>
      ) : shared.isError ? (
        <ErrorNotice
          title="Shared comparisons could not be loaded"
          error={shared.error}
          onRetry={() => void shared.refetch()}
        />
      ) : shared.data.length === 0 ? (
        <p className="text-loam-700">
          Nothing has been shared with you in this workspace yet. Your consultant shares comparisons from
          their page.
        </p>
      ) : (
        <ul className="flex flex-col gap-2">
          {shared.data.map((s) => (
            <li key={s.batchId}>
              <Link
                to={`/w/${workspace.id}/batches/${s.batchId}`}
                className="font-medium text-russet-700 underline underline-offset-4"
              >
                {s.title}
              </Link>
              <span className="text-sm text-loam-700"> — {s.strategies.join(', ')}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
