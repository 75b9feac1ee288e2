import { Link } from 'react-router-dom';
import { buttonClasses } from '../../shared/components/Button';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useRecentProjections, useScenarios } from './api';
import { groupBatches } from './batches';

/**
 * The first thing to open: the newest finished comparison of the workspace (the demo
 * farm ships with one), or, when there is none, the way to make one.
 */
export function QuickStart() {
  const workspace = useCurrentWorkspace();
  const recent = useRecentProjections(workspace.id, null, { poll: true });
  const scenarios = useScenarios(workspace.id);
  if (recent.isPending) return null;
  const finished = groupBatches(recent.data ?? []).find((b) => b.status === 'done' && b.strategies > 0);
  const name = finished?.scenarioId
    ? scenarios.data?.find((s) => s.id === finished.scenarioId)?.name
    : undefined;

  return (
    <section
      aria-labelledby="quick-start-title"
      className="flex flex-col gap-3 rounded-seed bg-humus-900 p-6 text-silt-50 on-humus sm:flex-row sm:items-center sm:justify-between"
    >
      <div className="flex flex-col gap-1">
        <h2 id="quick-start-title" className="font-display text-2xl font-semibold text-silt-50">
          {finished ? 'Quick start: see a comparison' : 'Quick start'}
        </h2>
        <p className="max-w-prose text-silt-200">
          {finished
            ? `${name ?? 'The latest comparison'}: ${finished.strategies} strategies and No control side by side — seedbank, plants, depletion odds, cost and net present value, with their uncertainty.`
            : workspace.role === 'viewer'
              ? 'Nothing has been run in this workspace yet.'
              : 'Create a scenario from a field, a species profile and the strategies to compare, then run it.'}
        </p>
      </div>
      {finished ? (
        <Link
          to={`/w/${workspace.id}/batches/${finished.batchId}`}
          className={`${buttonClasses('secondary')} shrink-0 border-silt-50`}
        >
          Open the comparison{name ? `: ${name}` : ''}
        </Link>
      ) : workspace.role !== 'viewer' ? (
        <Link to={`/w/${workspace.id}/scenarios/new`} className={`${buttonClasses('secondary')} shrink-0`}>
          New scenario
        </Link>
      ) : null}
    </section>
  );
}
