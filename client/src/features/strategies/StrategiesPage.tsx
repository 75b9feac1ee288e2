import { Link } from 'react-router-dom';
import type { StrategyView } from '../../../../shared/api/strategies';
import { timings } from '../../../../models/scenario/step-kinds';
import { buttonClasses } from '../../shared/components/Button';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useStrategies } from './api';
import { StepTile } from './StepGlyph';
import { kindInfo, timingInfo } from './stepKinds';

/** The workspace's strategies. `fieldNames` (by field id) comes from the fields feature, composed in the app. */
export function StrategiesPage({ fieldNames = {} }: { fieldNames?: Record<string, string> }) {
  const workspace = useCurrentWorkspace();
  const strategies = useStrategies(workspace.id);
  const canEdit = workspace.role !== 'viewer';

  return (
    <div className="flex flex-col gap-8">
      <title>{`Strategies · ${workspace.name} · Seedwake`}</title>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <PageTitle
          eyebrow={workspace.name}
          title="Strategies"
          lead="A strategy is a schedule of steps over the years: herbicides, hand removal, mowing, cultivation, mulch, stopping seed set."
        />
        {canEdit ? (
          <Link to={`/w/${workspace.id}/strategies/new`} className={buttonClasses('primary')}>
            New strategy
          </Link>
        ) : null}
      </div>
      {strategies.isPending ? (
        <LoadingNotice>Loading strategies…</LoadingNotice>
      ) : strategies.isError ? (
        <ErrorNotice
          title="Seedwake could not load the strategies"
          error={strategies.error}
          onRetry={() => void strategies.refetch()}
        />
      ) : strategies.data.length === 0 ? (
        <p className="rounded-seed border border-dashed border-loam-400 bg-silt-50 p-5 text-loam-700">
          {canEdit
            ? 'No strategies yet. Start one and add its steps season by season.'
            : 'No strategies yet.'}
        </p>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {strategies.data.map((s) => (
            <StrategyCard key={s.id} strategy={s} fieldName={s.fieldId ? fieldNames[s.fieldId] : undefined} />
          ))}
        </ul>
      )}
    </div>
  );
}

function StrategyCard({ strategy, fieldName }: { strategy: StrategyView; fieldName?: string }) {
  const workspace = useCurrentWorkspace();
  const steps = strategy.strategy.steps;
  return (
    <li className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet">
      <div>
        <h2 className="text-xl font-semibold">
          <Link
            to={`/w/${workspace.id}/strategies/${strategy.id}`}
            className="underline-offset-4 hover:text-russet-700 hover:underline"
          >
            {strategy.name}
          </Link>
        </h2>
        {fieldName ? <p className="text-sm text-loam-700">{fieldName}</p> : null}
      </div>
      {strategy.description ? <p className="text-loam-700">{strategy.description}</p> : null}
      {/* The steps in season order, as tiles: a glance at what the strategy does and when. */}
      <ol className="flex flex-wrap gap-2" aria-label="Steps by season">
        {[...steps]
          .sort((a, b) => timings.indexOf(a.timing) - timings.indexOf(b.timing))
          .map((step, i) => (
            <li key={i} className="flex items-center gap-1.5 rounded-seed bg-silt-100 py-1 pr-2 pl-1 text-xs">
              <StepTile kind={step.kind} className="size-6" />
              <span>
                <span className="sr-only">{kindInfo[step.kind].name}: </span>
                {timingInfo[step.timing].short}
              </span>
            </li>
          ))}
      </ol>
      <div className="mt-auto flex flex-wrap gap-2 text-xs font-semibold tracking-wide uppercase">
        <span className="rounded-sm bg-silt-200 px-2 py-0.5 text-loam-700">
          {steps.length} step{steps.length === 1 ? '' : 's'}
        </span>
        {strategy.hasChemicalStep ? (
          <span className="rounded-sm bg-clay-100 px-2 py-0.5 text-clay-800">Herbicide: cautions apply</span>
        ) : null}
        {strategy.rateWarnings.length > 0 ? (
          <span className="rounded-sm bg-clay-300 px-2 py-0.5 text-humus-900">
            {strategy.rateWarnings.length} rate warning{strategy.rateWarnings.length === 1 ? '' : 's'}
          </span>
        ) : null}
      </div>
    </li>
  );
}
