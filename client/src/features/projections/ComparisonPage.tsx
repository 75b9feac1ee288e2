import { Link, useParams } from 'react-router-dom';
import { buttonClasses } from '../../shared/components/Button';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { fileSlug } from '../../shared/lib/download';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { isActive, useBatch, useScenario } from './api';
import { ComparisonCharts } from './ComparisonCharts';
import { comparedProjections } from './comparison';
import { PesticideCautions } from './PesticideCautions';
import { ProgressList } from './ProgressList';
import { inDisplayOrder, snapshotOf } from './result';
import { RunButton } from './RunButton';
import { SummaryTable } from './SummaryTable';
import { SharePanel } from './SharePanel';

const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';
const launchedAt = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

/** /w/:workspaceId/batches/:batchId — one launch: 1–6 strategies and No control side by side. */
export function ComparisonPage() {
  const { batchId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const batch = useBatch(workspace.id, batchId);
  const scenarioId = batch.data?.[0]?.scenarioId ?? undefined;
  const scenario = useScenario(workspace.id, scenarioId);

  if (batch.isPending) return <LoadingNotice>Loading the comparison…</LoadingNotice>;
  if (batch.isError) {
    if (batch.error instanceof ApiRequestError && batch.error.status === 404)
      return <NotFoundNotice what="comparison" />;
    return (
      <ErrorNotice
        title="The comparison could not be loaded"
        error={batch.error}
        onRetry={() => void batch.refetch()}
      />
    );
  }
  const views = batch.data;
  const first = snapshotOf(views[0]);
  const name = scenario.data?.name ?? first.field.name;
  const compared = comparedProjections(views);
  const letItSeed = views.find((v) => v.role === 'let-it-seed');
  const running = batch.items.some(isActive);
  const unfinished = batch.items.filter((p) => p.status !== 'done');
  const chemical = inDisplayOrder(views).filter((v) => v.hasChemicalStep && v.role === 'strategy');
  const canEdit = workspace.role !== 'viewer';
  const subtitle = `${name} · ${first.field.name} · ${first.profile.name} · seed ${views[0].seed}`;
  const strategies = views.filter((v) => v.role === 'strategy').length;

  return (
    <div className="flex flex-col gap-8">
      <title>{`${name} · Comparison · Seedwake`}</title>
      <nav aria-label="Breadcrumb" className="flex flex-wrap gap-x-2 text-sm print:hidden">
        <Link to={`/w/${workspace.id}/scenarios`} className={linkClass}>
          Scenarios
        </Link>
        {scenarioId ? (
          <>
            <span aria-hidden="true">/</span>
            <Link to={`/w/${workspace.id}/scenarios/${scenarioId}`} className={linkClass}>
              {name}
            </Link>
          </>
        ) : null}
      </nav>
      <div className="flex flex-wrap items-end justify-between gap-6">
        <PageTitle
          eyebrow={`Comparison · ${strategies} ${strategies === 1 ? 'strategy' : 'strategies'} and No control`}
          title={name}
          lead={
            <>
              {first.field.name}, {first.profile.name}; {first.horizonYears} years, {first.replicates}{' '}
              replicates, seed <span className="font-mono">{views[0].seed}</span>; launched{' '}
              {launchedAt.format(new Date(views[0].queuedAt))}.
            </>
          }
        />
        {canEdit && scenarioId ? (
          <div className="flex flex-wrap items-start gap-3 print:hidden">
            <RunButton
              scenarioId={scenarioId}
              body={{ seed: views[0].seed }}
              label="Run again with the same seed"
              variant="secondary"
            />
            <Link to={`/w/${workspace.id}/scenarios/${scenarioId}`} className={buttonClasses('quiet')}>
              Edit the scenario
            </Link>
          </div>
        ) : null}
      </div>

      {running ? (
        <ProgressList items={inDisplayOrder(batch.items)} title="Running" />
      ) : unfinished.length > 0 ? (
        <ProgressList
          items={inDisplayOrder(unfinished)}
          title="Not finished: run again to complete the comparison"
        />
      ) : null}
      {chemical.length > 0 ? <PesticideCautions strategies={chemical.map((v) => v.label)} /> : null}
      <SharePanel batchId={views[0].batchId} finished={unfinished.length === 0} />

      {compared.length > 0 ? (
        <>
          <SummaryTable compared={compared} title={name} seed={views[0].seed} />
          <section aria-labelledby="charts-title" className="flex flex-col gap-4">
            <h2 id="charts-title" className="text-2xl font-semibold">
              Year by year, on the same axes
            </h2>
            <ComparisonCharts
              compared={compared}
              subtitle={subtitle}
              stem={`${fileSlug(name)}-seed-${views[0].seed}`}
            />
          </section>
        </>
      ) : null}

      <section
        aria-labelledby="let-it-seed-title"
        className="flex flex-col items-start gap-2 rounded-seed border border-dashed border-loam-400 bg-silt-50 p-5"
      >
        <h2 id="let-it-seed-title" className="text-2xl font-semibold">
          What one year of letting it seed costs
        </h2>
        <p className="max-w-prose text-loam-700">
          {letItSeed
            ? `This launch also ran “${letItSeed.label}”: the same strategy with seed set not prevented in year ${letItSeed.letItSeedYear}.`
            : 'Run a strategy again with one year in which seed set is not prevented, and see the extra seedbank and what it costs.'}
        </p>
        <Link to={`/w/${workspace.id}/batches/${batchId}/let-it-seed`} className={linkClass}>
          {letItSeed ? 'Open the let-it-seed view' : 'Price a year of letting it seed'}
        </Link>
      </section>
    </div>
  );
}
