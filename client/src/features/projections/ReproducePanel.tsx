import { useId } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button, buttonClasses } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useRerunBatch } from './api';
import { snapshotOf } from './result';
import type { ProjectionView } from '../../../../shared/api/projections';

const grouped = new Intl.NumberFormat('en-US');

/**
 * What makes the projection reproducible: its seed and its frozen input, with the
 * per-replicate trajectories to download and, for editors, a re-run with the same seed.
 */
export function ReproducePanel({ projection }: { projection: ProjectionView }) {
  const workspace = useCurrentWorkspace();
  const navigate = useNavigate();
  const launch = useRerunBatch(workspace.id);
  const titleId = useId();
  const scenario = snapshotOf(projection);
  const canRerun = workspace.role !== 'viewer';
  const csvHref = `/api/workspaces/${encodeURIComponent(workspace.id)}/projections/${encodeURIComponent(projection.id)}/replicates.csv`;

  const rerun = () => {
    launch.mutate(projection.batchId, {
      onSuccess: (launched) => {
        // Open the same strategy's projection in the new launch, or the launch itself.
        const twin = launched.projections.find(
          (p) => p.role === projection.role && p.strategyId === projection.strategyId,
        );
        navigate(
          twin
            ? `/w/${workspace.id}/projections/${twin.id}`
            : `/w/${workspace.id}/batches/${launched.batchId}`,
        );
      },
    });
  };

  return (
    <section
      aria-labelledby={titleId}
      className="flex flex-col gap-4 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <h2 id={titleId} className="text-2xl font-semibold">
        Reproduce this projection
      </h2>
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[auto_minmax(0,1fr)]">
        <dt className="text-loam-700">Seed</dt>
        <dd className="font-mono text-base text-humus-900">{projection.seed}</dd>
        <dt className="text-loam-700">Replicates</dt>
        <dd>{grouped.format(scenario.replicates)}</dd>
        <dt className="text-loam-700">Horizon</dt>
        <dd>{scenario.horizonYears} years</dd>
        <dt className="text-loam-700">Efficacy draw</dt>
        <dd>
          {scenario.efficacyDraw === 'per-replicate' ? 'Once per replicate' : 'Afresh at each application'}
        </dd>
      </dl>
      <p className="max-w-prose text-sm text-loam-700">
        The same input and seed give the same numbers, bit for bit, on any machine. The input below is the
        exact snapshot this projection was run from; later edits to the scenario do not change it.
      </p>
      <div className="flex flex-wrap gap-3 print:hidden">
        {canRerun ? (
          <Button
            variant="primary"
            size="sm"
            pending={launch.isPending}
            pendingLabel="Launching…"
            onClick={rerun}
          >
            Re-run with the same seed
          </Button>
        ) : null}
        {projection.status === 'done' ? (
          <a href={csvHref} download className={buttonClasses('secondary', 'sm')}>
            Download per-replicate CSV
          </a>
        ) : null}
      </div>
      {canRerun ? (
        <p className="max-w-prose text-xs text-loam-700">
          A re-run repeats this launch from its frozen input with seed {projection.seed}, for every strategy
          it compared, so it gives the same numbers even if the scenario was edited since.
        </p>
      ) : null}
      <FormAlert error={launch.error} />
      <details className="rounded-seed border border-silt-300 bg-silt-50">
        <summary className="cursor-pointer px-4 py-2 font-medium text-humus-900">
          Input snapshot (JSON)
        </summary>
        <pre
          tabIndex={0}
          aria-label="Input snapshot"
          className="max-h-96 overflow-auto border-t border-silt-300 px-4 py-3 font-mono text-xs text-humus-900"
        >
          {JSON.stringify(scenario, null, 2)}
        </pre>
      </details>
    </section>
  );
}
