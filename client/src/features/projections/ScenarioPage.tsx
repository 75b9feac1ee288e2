import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle, Panel } from '../../shared/components/Panel';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import {
  useDeleteScenario,
  useRecentProjections,
  useScenario,
  useScenarioChoices,
  type ScenarioChoices,
} from './api';
import { BatchList } from './BatchList';
import { groupBatches } from './batches';
import { formatAmount, formatPercent, useDisplayUnits } from './display';
import { RunButton } from './RunButton';
import { ScenarioForm } from './ScenarioForm';
import type { ScenarioView } from '../../../../shared/api/scenarios';

const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';

/** What a viewer sees in place of the editor. */
function ScenarioFacts({ scenario, choices }: { scenario: ScenarioView; choices: ScenarioChoices }) {
  const units = useDisplayUnits();
  const names = scenario.strategyIds.map(
    (id) => choices.strategies.find((s) => s.id === id)?.name ?? 'a strategy',
  );
  const rows: [string, string][] = [
    ['Field', choices.fields.find((f) => f.id === scenario.fieldId)?.name ?? '—'],
    ['Species profile', choices.profiles.find((p) => p.id === scenario.profileId)?.name ?? '—'],
    ['Strategies', names.join('; ')],
    ['Horizon', `${scenario.horizonYears} years`],
    ['Replicates', scenario.replicates.toLocaleString('en-US')],
    ['Seed', String(scenario.seed)],
    [
      'Efficacy draw',
      scenario.efficacyDraw === 'per-replicate' ? 'Once per replicate' : 'At every application',
    ],
    ['Depletion threshold', `${formatAmount(units.density(scenario.depletionThreshold))} ${units.seedUnit}`],
    ['Discount rate', `${formatPercent(scenario.discountRate, 1)} per year`],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[12rem_minmax(0,1fr)]">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-loam-700">{k}</dt>
          <dd className="text-humus-900">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

function DeleteScenario({ id }: { id: string }) {
  const workspace = useCurrentWorkspace();
  const navigate = useNavigate();
  const remove = useDeleteScenario(workspace.id);
  const [confirming, setConfirming] = useState(false);
  return (
    <div className="flex flex-col items-start gap-2">
      {confirming ? (
        <div className="flex flex-wrap items-center gap-3">
          <p className="text-sm text-humus-900">
            Delete this scenario? Its finished projections stay readable.
          </p>
          <Button
            variant="danger"
            size="sm"
            pending={remove.isPending}
            onClick={() => remove.mutate(id, { onSuccess: () => navigate(`/w/${workspace.id}/scenarios`) })}
          >
            Delete the scenario
          </Button>
          <Button variant="quiet" size="sm" onClick={() => setConfirming(false)}>
            Keep it
          </Button>
        </div>
      ) : (
        <Button variant="quiet" size="sm" onClick={() => setConfirming(true)}>
          Delete scenario…
        </Button>
      )}
      <FormAlert error={remove.error} />
    </div>
  );
}

/** /w/:workspaceId/scenarios/new and /w/:workspaceId/scenarios/:scenarioId */
export function ScenarioPage() {
  const { scenarioId } = useParams();
  const workspace = useCurrentWorkspace();
  const canEdit = workspace.role !== 'viewer';
  const scenario = useScenario(workspace.id, scenarioId);
  const choices = useScenarioChoices(workspace.id);
  const runs = useRecentProjections(workspace.id, scenarioId ?? null, { poll: true });
  const isNew = scenarioId === undefined;

  if ((!isNew && scenario.isPending) || choices.isPending)
    return <LoadingNotice>Loading the scenario…</LoadingNotice>;
  if (scenario.isError) {
    if (scenario.error instanceof ApiRequestError && scenario.error.status === 404)
      return <NotFoundNotice what="scenario" />;
    return (
      <ErrorNotice
        title="The scenario could not be loaded"
        error={scenario.error}
        onRetry={() => void scenario.refetch()}
      />
    );
  }
  if (choices.isError) {
    return (
      <ErrorNotice
        title="The fields, profiles and strategies could not be loaded"
        error={choices.error}
        onRetry={() => void choices.refetch()}
      />
    );
  }
  if (isNew && !canEdit) return <NotFoundNotice what="page" />;
  const view = scenario.data;
  const batches = isNew ? [] : groupBatches(runs.data ?? []);
  const title = view?.name ?? 'New scenario';

  return (
    <div className="flex flex-col gap-8">
      <title>{`${title} · Scenarios · Seedwake`}</title>
      <nav aria-label="Breadcrumb" className="text-sm print:hidden">
        <Link to={`/w/${workspace.id}/scenarios`} className={linkClass}>
          ← Scenarios
        </Link>
      </nav>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <PageTitle
          eyebrow="Scenario"
          title={title}
          lead={
            isNew
              ? 'Pick a field, a species profile and the strategies to compare, then set how the projection runs.'
              : canEdit
                ? 'Change what is compared or how it runs. Earlier runs keep the input they were made from.'
                : undefined
          }
        />
        {view && canEdit ? <RunButton scenarioId={view.id} label="Run as saved" variant="secondary" /> : null}
      </div>
      <div className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Panel>
          {canEdit ? (
            <ScenarioForm key={view?.id ?? 'new'} scenario={view} choices={choices.data} />
          ) : view ? (
            <ScenarioFacts scenario={view} choices={choices.data} />
          ) : null}
        </Panel>
        {!isNew ? (
          <section
            aria-labelledby="runs-title"
            className="flex flex-col gap-3 self-start rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
          >
            <h2 id="runs-title" className="text-2xl font-semibold">
              Runs
            </h2>
            {runs.isPending ? (
              <LoadingNotice>Loading runs…</LoadingNotice>
            ) : batches.length === 0 ? (
              <p className="text-loam-700">Not run yet.</p>
            ) : (
              <BatchList batches={batches} />
            )}
            {canEdit && view ? (
              <div className="mt-4 border-t border-silt-200 pt-4">
                <DeleteScenario id={view.id} />
              </div>
            ) : null}
          </section>
        ) : null}
      </div>
    </div>
  );
}
