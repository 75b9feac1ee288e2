import { Link } from 'react-router-dom';
import { buttonClasses } from '../../shared/components/Button';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle, Panel } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useRecentProjections, useScenarioChoices, useScenarios } from './api';
import { groupBatches } from './batches';
import { statusNames } from './result';

/** /w/:workspaceId/scenarios — what is projected in this workspace, each with its latest launch. */
export function ScenariosPage() {
  const workspace = useCurrentWorkspace();
  const scenarios = useScenarios(workspace.id);
  const choices = useScenarioChoices(workspace.id);
  const recent = useRecentProjections(workspace.id, null);
  const canEdit = workspace.role !== 'viewer';

  const heading = (
    <div className="flex flex-wrap items-end justify-between gap-4">
      <PageTitle
        eyebrow={workspace.name}
        title="Scenarios"
        lead="A scenario is a field, a species profile and the strategies to compare on it, with the settings of the projection. Each run launches every strategy and No control with one seed."
      />
      {canEdit ? (
        <Link to={`/w/${workspace.id}/scenarios/new`} className={buttonClasses('primary')}>
          New scenario
        </Link>
      ) : null}
    </div>
  );

  if (scenarios.isPending)
    return (
      <div className="flex flex-col gap-6">
        {heading}
        <LoadingNotice>Loading scenarios…</LoadingNotice>
      </div>
    );
  if (scenarios.isError) {
    return (
      <div className="flex flex-col gap-6">
        {heading}
        <ErrorNotice
          title="The scenarios could not be loaded"
          error={scenarios.error}
          onRetry={() => void scenarios.refetch()}
        />
      </div>
    );
  }
  const batches = groupBatches(recent.data ?? []);
  const fieldName = (id: string) => choices.data?.fields.find((f) => f.id === id)?.name;
  const profileName = (id: string) => choices.data?.profiles.find((p) => p.id === id)?.name;

  return (
    <div className="flex flex-col gap-6">
      <title>{`Scenarios · ${workspace.name} · Seedwake`}</title>
      {heading}
      {scenarios.data.length === 0 ? (
        <Panel>
          <p className="text-humus-900">No scenarios yet.</p>
          <p className="mt-1 text-loam-700">
            {canEdit
              ? 'Create one from a field, a species profile and the strategies you want to compare.'
              : 'When an editor creates a scenario, it appears here.'}
          </p>
        </Panel>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {scenarios.data.map((s) => {
            const latest = batches.find((b) => b.scenarioId === s.id);
            return (
              <li
                key={s.id}
                className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
              >
                <h2 className="text-2xl font-semibold">
                  <Link
                    to={`/w/${workspace.id}/scenarios/${s.id}`}
                    className="underline decoration-loam-400 underline-offset-4 hover:text-russet-700"
                  >
                    {s.name}
                  </Link>
                </h2>
                <p className="text-sm text-loam-700">
                  {[fieldName(s.fieldId), profileName(s.profileId)].filter(Boolean).join(' · ')}
                  {fieldName(s.fieldId) ? ' · ' : ''}
                  {s.strategyIds.length} {s.strategyIds.length === 1 ? 'strategy' : 'strategies'} ·{' '}
                  {s.horizonYears} years · {s.replicates.toLocaleString('en-US')} replicates
                </p>
                {latest ? (
                  <p className="mt-auto border-t border-silt-200 pt-3 text-sm">
                    <Link
                      to={`/w/${workspace.id}/batches/${latest.batchId}`}
                      className="font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
                    >
                      Latest comparison
                    </Link>{' '}
                    <span className="text-loam-700">
                      · {statusNames[latest.status]} · seed <span className="font-mono">{latest.seed}</span>
                    </span>
                  </p>
                ) : (
                  <p className="mt-auto border-t border-silt-200 pt-3 text-sm text-loam-700">Not run yet.</p>
                )}
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
