import { Link, useParams } from 'react-router-dom';
import { BandChart } from '../../shared/charts/BandChart';
import { ChartFrame } from '../../shared/charts/ChartFrame';
import { strategyStyles } from '../../shared/charts/palette';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { downloadCsv } from '../../shared/lib/csv';
import { fileSlug } from '../../shared/lib/download';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { Button } from '../../shared/components/Button';
import { isActive, useBatch } from './api';
import { bandLegend, bandSeries } from './chartSeries';
import { formatAmount, formatMoney, useDisplayUnits, type DisplayUnits } from './display';
import { LetItSeedForm } from './LetItSeedForm';
import { PesticideCautions } from './PesticideCautions';
import { ProgressList } from './ProgressList';
import { isFinished, snapshotOf, type FinishedProjection } from './result';

const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';

const words = [
  'zero',
  'one',
  'two',
  'three',
  'four',
  'five',
  'six',
  'seven',
  'eight',
  'nine',
  'ten',
  'eleven',
  'twelve',
];
const yearsInWords = (n: number) => `${n < words.length ? words[n] : n} year${n === 1 ? '' : 's'}`;

/** Letting it seed against the same strategy: the extra seedbank by year and the NPV given up. */
function pricing(kept: FinishedProjection, letSeed: FinishedProjection, units: DisplayUnits) {
  const a = kept.result.summary;
  const b = letSeed.result.summary;
  const H = a.horizonYears;
  // Differences of means: the mean of the paired differences, whatever the spread.
  const extraSeeds = a.years.map((t) =>
    units.density(b.series.seedbankTotal.mean[t] - a.series.seedbankTotal.mean[t]),
  );
  const extraPlants = a.years.map((t) =>
    units.density(b.series.established.mean[t] - a.series.established.mean[t]),
  );
  const npvCost = units.money(a.economics.npvPerHa.mean - b.economics.npvPerHa.mean);
  return { H, extraSeeds, extraPlants, npvCost };
}

function Sentence({
  year,
  H,
  extra,
  cost,
  units,
}: {
  year: number;
  H: number;
  extra: number;
  cost: number;
  units: DisplayUnits;
}) {
  const seeds = `${formatAmount(Math.abs(extra))} ${extra >= 0 ? 'more' : 'fewer'} seeds per ${units.smallArea}`;
  const money =
    cost >= 0
      ? `costs ${formatMoney(cost)} per ${units.area} over ${yearsInWords(H)}`
      : `comes out ${formatMoney(-cost)} per ${units.area} ahead over ${yearsInWords(H)}, because the skipped step is not paid for — the extra seed stays in the soil beyond the horizon`;
  return (
    <p className="max-w-prose font-display text-2xl leading-snug text-humus-900 sm:text-3xl">
      Letting the plants seed in year {year} leaves {seeds} in year {H} and {money}.
    </p>
  );
}

/** /w/:workspaceId/batches/:batchId/let-it-seed */
export function LetItSeedPage() {
  const { batchId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const units = useDisplayUnits();
  const batch = useBatch(workspace.id, batchId);

  if (batch.isPending) return <LoadingNotice>Loading the let-it-seed view…</LoadingNotice>;
  if (batch.isError) {
    if (batch.error instanceof ApiRequestError && batch.error.status === 404)
      return <NotFoundNotice what="comparison" />;
    return (
      <ErrorNotice
        title="The let-it-seed view could not be loaded"
        error={batch.error}
        onRetry={() => void batch.refetch()}
      />
    );
  }
  const views = batch.data;
  const first = snapshotOf(views[0]);
  const letSeed = views.find((v) => v.role === 'let-it-seed');
  const kept = letSeed
    ? views.find((v) => v.role === 'strategy' && v.strategyId === letSeed.strategyId)
    : undefined;
  const progress = batch.items.filter((p) => p.id === letSeed?.id || p.id === kept?.id);
  const canEdit = workspace.role !== 'viewer' && views[0].scenarioId !== null;
  const strategyChoices = views
    .filter((v) => v.role === 'strategy' && v.strategyId !== null)
    .map((v) => ({ strategyId: v.strategyId!, label: v.label }));
  const ready = letSeed && kept && isFinished(letSeed) && isFinished(kept) ? { letSeed, kept } : null;
  const priced = ready ? pricing(ready.kept, ready.letSeed, units) : null;
  const year = letSeed?.letItSeedYear ?? 0;
  const subtitle = `${first.field.name} · ${first.profile.name} · seed ${views[0].seed}`;

  const exportCsv = () => {
    if (!priced || !ready) return;
    const a = ready.kept.result.summary;
    const b = ready.letSeed.result.summary;
    downloadCsv(
      `${fileSlug(ready.kept.label)}-let-it-seed-year-${year}-seed-${views[0].seed}`,
      [
        'year',
        `seedbankMeanStrategy (${units.seedUnit})`,
        `seedbankMeanLetItSeed (${units.seedUnit})`,
        `extraSeedbankMean (${units.seedUnit})`,
        `extraEstablishedMean (${units.plantUnit})`,
      ],
      a.years.map((t) => [
        t,
        units.density(a.series.seedbankTotal.mean[t]),
        units.density(b.series.seedbankTotal.mean[t]),
        priced.extraSeeds[t],
        priced.extraPlants[t],
      ]),
    );
  };

  return (
    <div className="flex flex-col gap-8">
      <title>{`Let it seed · Seedwake`}</title>
      <nav aria-label="Breadcrumb" className="text-sm print:hidden">
        <Link to={`/w/${workspace.id}/batches/${batchId}`} className={linkClass}>
          ← Back to the comparison
        </Link>
      </nav>
      <PageTitle
        eyebrow="Let it seed"
        title={
          kept
            ? `${kept.label}, with seed set allowed in year ${year}`
            : 'What one year of letting it seed costs'
        }
        lead={
          <>
            One strategy run twice with the same seed: as planned, and with its seed-set steps (mowing,
            seed-head removal) skipped in one year. The difference is what that one year costs.{' '}
            {first.field.name}, {first.profile.name}, {first.horizonYears} years, {first.replicates}{' '}
            replicates.
          </>
        }
      />

      {progress.some(isActive) ? <ProgressList items={progress} title="Running" /> : null}
      {kept?.hasChemicalStep ? <PesticideCautions strategies={[kept.label]} /> : null}

      {ready && priced ? (
        <>
          <section
            aria-label="The cost in plain words"
            className="rounded-seed border border-silt-300 bg-white p-6 shadow-sheet"
          >
            <Sentence
              year={year}
              H={priced.H}
              extra={priced.extraSeeds[priced.H]}
              cost={priced.npvCost}
              units={units}
            />
            <p className="mt-3 max-w-prose text-sm text-loam-700">
              Seeds and money are differences of means across {first.replicates} replicates; the money is the
              net present value given up, per {units.area}, at the scenario’s discount rate.
            </p>
          </section>
          <div className="grid gap-6 xl:grid-cols-2">
            <ChartFrame
              title={`Seedbank, planned and let seed (${units.seedUnit})`}
              exportSubtitle={subtitle}
              filename={`${fileSlug(ready.kept.label)}-let-it-seed-year-${year}`}
              lead="Median and middle 50 % of replicates of both runs."
            >
              <BandChart
                title={`Seedbank with and without seed set in year ${year}, in ${units.seedUnit}`}
                summary={`In year ${priced.H} the let-it-seed run holds ${formatAmount(priced.extraSeeds[priced.H])} ${units.seedUnit} more on average.`}
                x={ready.kept.result.summary.years}
                series={[
                  bandSeries(
                    'kept',
                    'As planned',
                    strategyStyles[0],
                    ready.kept.result.summary.series.seedbankTotal,
                    units.density,
                    'inner',
                  ),
                  bandSeries(
                    'let',
                    `Seed set allowed in year ${year}`,
                    strategyStyles[1],
                    ready.letSeed.result.summary.series.seedbankTotal,
                    units.density,
                    'inner',
                  ),
                ]}
                yLabel={units.seedUnit}
                formatValue={(v) => `${formatAmount(v)} ${units.seedUnit}`}
                bandLegend={{ inner: bandLegend.inner }}
              />
            </ChartFrame>
            <ChartFrame
              title={`Extra seedbank (${units.seedUnit})`}
              exportSubtitle={subtitle}
              filename={`${fileSlug(ready.kept.label)}-extra-seedbank-year-${year}`}
              lead="Mean seedbank of the let-it-seed run minus the planned run, year by year."
            >
              <BandChart
                title={`Extra seedbank from letting it seed in year ${year}, in ${units.seedUnit}`}
                summary={`The extra seedbank is ${priced.extraSeeds.map((v, t) => `${formatAmount(v)} in year ${t}`).join(', ')}.`}
                x={ready.kept.result.summary.years}
                series={[
                  {
                    id: 'extra',
                    label: 'Extra seeds, mean difference',
                    style: strategyStyles[1],
                    values: priced.extraSeeds,
                  },
                ]}
                yLabel={units.seedUnit}
                formatValue={(v) => `${formatAmount(v)} ${units.seedUnit}`}
              />
            </ChartFrame>
          </div>
          <section
            aria-labelledby="extra-table"
            className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
          >
            <div className="flex flex-wrap items-end justify-between gap-3">
              <h2 id="extra-table" className="text-2xl font-semibold">
                Year by year
              </h2>
              <Button variant="secondary" size="sm" onClick={exportCsv} className="print:hidden">
                Download table (CSV)
              </Button>
            </div>
            <div className="overflow-x-auto">
              <table className="w-full min-w-[34rem] border-collapse text-sm">
                <caption className="sr-only">
                  Extra seedbank and plants from letting it seed in year {year}
                </caption>
                <thead>
                  <tr className="border-b-2 border-humus-900">
                    <th scope="col" className="py-2 pr-3 text-left font-semibold">
                      Year
                    </th>
                    <th scope="col" className="px-3 py-2 text-right font-semibold">
                      Seedbank, as planned ({units.seedUnit})
                    </th>
                    <th scope="col" className="px-3 py-2 text-right font-semibold">
                      Seedbank, let seed ({units.seedUnit})
                    </th>
                    <th scope="col" className="px-3 py-2 text-right font-semibold">
                      Extra seeds ({units.seedUnit})
                    </th>
                    <th scope="col" className="py-2 pl-3 text-right font-semibold">
                      Extra plants ({units.plantUnit})
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {ready.kept.result.summary.years.map((t) => (
                    <tr key={t} className={`border-b border-silt-200 ${t === year ? 'bg-clay-100/60' : ''}`}>
                      <th scope="row" className="py-1.5 pr-3 text-left font-medium">
                        {t}
                        {t === year ? (
                          <span className="ml-2 text-xs font-normal text-loam-700">seed set allowed</span>
                        ) : null}
                      </th>
                      <td className="px-3 py-1.5 text-right">
                        {formatAmount(units.density(ready.kept.result.summary.series.seedbankTotal.mean[t]))}
                      </td>
                      <td className="px-3 py-1.5 text-right">
                        {formatAmount(
                          units.density(ready.letSeed.result.summary.series.seedbankTotal.mean[t]),
                        )}
                      </td>
                      <td className="px-3 py-1.5 text-right font-semibold">
                        {formatAmount(priced.extraSeeds[t])}
                      </td>
                      <td className="py-1.5 pl-3 text-right">{formatAmount(priced.extraPlants[t])}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </section>
        </>
      ) : !letSeed ? (
        <p className="max-w-prose text-loam-700">
          This launch has no let-it-seed run yet.{' '}
          {canEdit
            ? 'Choose a strategy and a year below to price one.'
            : 'An editor can launch one from here.'}
        </p>
      ) : null}

      {canEdit && strategyChoices.length > 0 ? (
        <section
          aria-labelledby="let-it-seed-form"
          className="flex flex-col gap-4 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet print:hidden"
        >
          <h2 id="let-it-seed-form" className="text-2xl font-semibold">
            {letSeed ? 'Price another year or strategy' : 'Price a year of letting it seed'}
          </h2>
          <LetItSeedForm
            scenarioId={views[0].scenarioId!}
            seed={views[0].seed}
            horizon={first.horizonYears}
            strategies={strategyChoices}
            initial={
              letSeed?.strategyId && letSeed.letItSeedYear
                ? { strategyId: letSeed.strategyId, year: letSeed.letItSeedYear }
                : undefined
            }
          />
        </section>
      ) : null}
    </div>
  );
}
