import { Link } from 'react-router-dom';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useRecentProjections, useScenarios } from './api';
import { BatchList } from './BatchList';
import { groupBatches } from './batches';

/** The newest launches of the workspace, for the dashboard; follows progress while any runs. */
export function RecentProjectionsCard() {
  const workspace = useCurrentWorkspace();
  const recent = useRecentProjections(workspace.id, null, { poll: true });
  const scenarios = useScenarios(workspace.id);
  const names = new Map((scenarios.data ?? []).map((s) => [s.id, s.name]));
  const batches = groupBatches(recent.data ?? []).slice(0, 5);
  return (
    <section
      aria-labelledby="recent-projections-title"
      className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <div className="flex items-baseline justify-between gap-3">
        <h2 id="recent-projections-title" className="text-2xl font-semibold">
          Recent projections
        </h2>
        <Link
          to={`/w/${workspace.id}/scenarios`}
          className="text-sm font-medium text-russet-700 underline underline-offset-4"
        >
          Scenarios
        </Link>
      </div>
      {recent.isPending ? (
        <LoadingNotice>Loading projections…</LoadingNotice>
      ) : recent.isError ? (
        <ErrorNotice
          title="Projections could not be loaded"
          error={recent.error}
          onRetry={() => void recent.refetch()}
        />
      ) : batches.length === 0 ? (
        <p className="text-loam-700">
          {workspace.role === 'viewer'
            ? 'When an editor runs a scenario, its comparison appears here.'
            : 'No projections yet: create a scenario and run it.'}
        </p>
      ) : (
        <BatchList batches={batches} scenarioNames={names} />
      )}
    </section>
  );
}
