import { Link } from 'react-router-dom';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import type { BatchSummary } from './batches';
import { statusNames } from './result';

const when = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

/** Launches as a list: when, which seed, how many strategies, how far along. */
export function BatchList({
  batches,
  scenarioNames,
}: {
  batches: readonly BatchSummary[];
  scenarioNames?: Map<string, string>;
}) {
  const workspace = useCurrentWorkspace();
  return (
    <ul className="flex flex-col divide-y divide-silt-200">
      {batches.map((b) => {
        const done = b.projections.reduce((n, p) => n + p.replicatesDone, 0);
        const all = b.projections.reduce((n, p) => n + p.replicates, 0);
        const name = b.scenarioId ? scenarioNames?.get(b.scenarioId) : undefined;
        return (
          <li key={b.batchId} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 py-3">
            <span className="flex min-w-0 flex-col">
              <Link
                to={`/w/${workspace.id}/batches/${b.batchId}`}
                className="font-medium text-humus-900 underline decoration-loam-400 underline-offset-4 hover:text-russet-700"
              >
                {name ? `${name}: ` : ''}
                {b.strategies} {b.strategies === 1 ? 'strategy' : 'strategies'} and No control
                {b.hasLetItSeed ? ', with a let-it-seed run' : ''}
              </Link>
              <span className="text-sm text-loam-700">
                {when.format(new Date(b.queuedAt))} · seed <span className="font-mono">{b.seed}</span>
              </span>
            </span>
            <span className="text-sm text-humus-900">
              {statusNames[b.status]}
              {b.status === 'running' || b.status === 'queued'
                ? ` · ${Math.round((100 * done) / Math.max(1, all))} %`
                : ''}
            </span>
          </li>
        );
      })}
    </ul>
  );
}
