import { Link } from 'react-router-dom';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useStrategies } from './api';

/** The workspace's strategies in a dashboard card, each linking to its builder. */
export function StrategiesCard() {
  const workspace = useCurrentWorkspace();
  const strategies = useStrategies(workspace.id);
  const canEdit = workspace.role !== 'viewer';
  return (
    <section
      aria-labelledby="strategies-card-title"
      className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <div className="flex items-baseline justify-between gap-3">
        <h2 id="strategies-card-title" className="text-2xl font-semibold">
          <Link to={`/w/${workspace.id}/strategies`} className="underline-offset-4 hover:underline">
            Strategies
          </Link>
        </h2>
        {canEdit ? (
          <Link
            to={`/w/${workspace.id}/strategies/new`}
            className="text-sm font-medium text-russet-700 underline underline-offset-4"
          >
            New strategy
          </Link>
        ) : null}
      </div>
      {strategies.isPending ? (
        <LoadingNotice>Loading strategies…</LoadingNotice>
      ) : strategies.isError ? (
        <ErrorNotice
          title="Strategies could not be loaded"
          error={strategies.error}
          onRetry={() => void strategies.refetch()}
        />
      ) : strategies.data.length === 0 ? (
        <p className="text-loam-700">
          {canEdit ? 'No strategies yet: build one step by step.' : 'No strategies yet.'}
        </p>
      ) : (
        <ul className="flex flex-col divide-y divide-silt-200">
          {strategies.data.map((s) => (
            <li key={s.id} className="py-2">
              <Link
                to={`/w/${workspace.id}/strategies/${s.id}`}
                className="font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
              >
                {s.name}
              </Link>
              <p className="text-sm text-loam-700">
                {s.strategy.steps.length} step{s.strategy.steps.length === 1 ? '' : 's'}
                {s.hasChemicalStep ? ' · herbicide: cautions apply' : ''}
                {s.rateWarnings.length > 0 ? ` · ${s.rateWarnings.length} rate warning(s)` : ''}
              </p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
