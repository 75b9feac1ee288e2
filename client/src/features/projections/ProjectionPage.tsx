import { Link, useParams } from 'react-router-dom';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { isActive, useProjection } from './api';
import { formatAmount, formatMoney, formatPercent, useDisplayUnits } from './display';
import { ElasticityPanel } from './ElasticityPanel';
import { KeyFigures } from './KeyFigures';
import { PesticideCautions } from './PesticideCautions';
import { ProgressList } from './ProgressList';
import { ProjectionCharts } from './ProjectionCharts';
import { ReproducePanel } from './ReproducePanel';
import { isFinished, snapshotOf, statusNames } from './result';
import { YearTable } from './YearTable';

const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';

/** /w/:workspaceId/projections/:projectionId — one projection, from progress to its full result. */
export function ProjectionPage() {
  const { projectionId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const units = useDisplayUnits();
  const query = useProjection(workspace.id, projectionId);

  if (query.isPending) return <LoadingNotice>Loading the projection…</LoadingNotice>;
  if (query.isError) {
    if (query.error instanceof ApiRequestError && query.error.status === 404)
      return <NotFoundNotice what="projection" />;
    return (
      <ErrorNotice
        title="The projection could not be loaded"
        error={query.error}
        onRetry={() => void query.refetch()}
      />
    );
  }
  const view = query.data;
  const scenario = snapshotOf(view);
  const subtitle = `${scenario.field.name} · ${scenario.profile.name} · seed ${view.seed} · ${scenario.replicates} replicates`;

  const header = (
    <>
      <title>{`${view.label} · Projection · Seedwake`}</title>
      <nav aria-label="Breadcrumb" className="text-sm print:hidden">
        <Link to={`/w/${workspace.id}/batches/${view.batchId}`} className={linkClass}>
          ← The comparison this projection belongs to
        </Link>
      </nav>
      <PageTitle
        eyebrow={
          view.role === 'baseline'
            ? 'Projection · reference'
            : view.role === 'let-it-seed'
              ? 'Projection · let it seed'
              : 'Projection'
        }
        title={view.label}
        lead={
          <>
            {scenario.field.name} ({formatAmount(units.landArea(scenario.field.areaHa))} {units.areaPlural}),{' '}
            {scenario.profile.name}, {scenario.horizonYears} years, {scenario.replicates} replicates.
          </>
        }
      />
    </>
  );

  if (!isFinished(view)) {
    return (
      <div className="flex flex-col gap-6">
        {header}
        {isActive(view) ? (
          <ProgressList items={[view]} />
        ) : (
          <div role="status" className="rounded-seed border border-silt-300 bg-white p-5">
            <p className="font-semibold">{statusNames[view.status]}</p>
            <p className="text-loam-700">
              {view.error ?? 'This projection has no result. Re-run it with the same seed to get one.'}
            </p>
          </div>
        )}
        {view.hasChemicalStep ? <PesticideCautions /> : null}
        <ReproducePanel projection={view} />
      </div>
    );
  }

  const { summary, matrix } = view.result;
  const H = summary.horizonYears;
  const total = summary.series.seedbankTotal;
  const decline = summary.decline.find((d) => d.fraction === 0.9);

  return (
    <div className="flex flex-col gap-8">
      {header}
      {view.hasChemicalStep ? <PesticideCautions /> : null}
      <KeyFigures
        items={[
          {
            label: `Seedbank in year ${H}, median`,
            value: formatAmount(units.density(total.q50[H])),
            unit: units.seedUnit,
            note: `90 % of replicates: ${formatAmount(units.density(total.q05[H]))}–${formatAmount(units.density(total.q95[H]))}`,
          },
          {
            label: `Probability of depletion, year ${H}`,
            value: formatPercent(summary.depletionProbability[H]),
            note: `Below ${formatAmount(units.density(scenario.depletionThreshold))} ${units.seedUnit}`,
          },
          {
            label: 'Years to a 90 % decline',
            value: decline?.medianYears ?? `> ${H}`,
            unit: decline?.medianYears != null ? 'years' : undefined,
            note: decline
              ? `${formatPercent(decline.proportionReached)} of replicates get there within ${H} years`
              : undefined,
          },
          {
            label: 'Net present value, median',
            value: formatMoney(units.money(summary.economics.npvPerHa.q50)),
            unit: `per ${units.area}`,
            note: `Over ${H} years at ${formatPercent(scenario.discountRate, 1)} a year`,
          },
        ]}
      />
      <ProjectionCharts projection={view} subtitle={subtitle} />
      <YearTable projection={view} />
      <ElasticityPanel matrix={matrix} />
      <ReproducePanel projection={view} />
    </div>
  );
}
