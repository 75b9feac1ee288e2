import { useState } from 'react';
import type { SeriesSummary } from '../../../../models/projection/summarise';
import { BandChart } from '../../shared/charts/BandChart';
import { ChartFrame } from '../../shared/charts/ChartFrame';
import { ChartOption } from '../../shared/charts/ChartOption';
import { bandLegend, bandSeries, type Bands } from './chartSeries';
import type { Compared } from './comparison';
import { formatAmount, formatMoney, formatPercent, useDisplayUnits } from './display';
import type { ProjectionSummary } from '../../../../models/projection/summarise';

const bandOptions = [
  { value: 'inner', label: '50 %' },
  { value: 'outer', label: '90 %' },
  { value: 'none', label: 'None' },
] as const;

const scaleOptions = [
  { value: 'linear', label: 'Linear' },
  { value: 'log', label: 'Log' },
] as const;

/** The two plant-stage charts differ only in the series they draw. */
const plantCharts = [
  {
    series: 'established',
    name: 'Established plants',
    lead: 'Median established plants of each strategy at each census.',
  },
  {
    series: 'flowering',
    name: 'Flowering plants',
    lead: 'Median flowering plants: the ones that can set seed.',
  },
] as const;

/** A sentence naming each line's median at the horizon, read out in place of the drawing. */
function describe(
  compared: readonly Compared[],
  what: string,
  pick: (s: ProjectionSummary) => number[],
  format: (v: number) => string,
) {
  const H = compared[0].projection.result.summary.horizonYears;
  return `${what} in year ${H}: ${compared
    .map((c) => `${c.projection.label} ${format(pick(c.projection.result.summary)[H])}`)
    .join('; ')}.`;
}

/** Every strategy and No control on the same axes, one chart per measure. */
export function ComparisonCharts({
  compared,
  subtitle,
  stem,
}: {
  compared: readonly Compared[];
  subtitle: string;
  stem: string;
}) {
  const units = useDisplayUnits();
  const [bands, setBands] = useState<Exclude<Bands, 'both'>>('inner');
  const [scale, setScale] = useState<'linear' | 'log'>('log');
  if (compared.length === 0) return null;
  const x = compared[0].projection.result.summary.years;
  const legend =
    bands === 'inner'
      ? { inner: bandLegend.inner }
      : bands === 'outer'
        ? { outer: bandLegend.outer }
        : undefined;

  const lines = (pick: (s: ProjectionSummary) => SeriesSummary, convert: (v: number) => number) =>
    compared.map((c) =>
      bandSeries(
        c.projection.id,
        c.projection.label,
        c.style,
        pick(c.projection.result.summary),
        convert,
        bands,
      ),
    );

  const threshold = compared[0].projection.snapshot.depletionThreshold;
  const depletionLead = `Share of replicates whose seedbank is below the depletion threshold of ${formatAmount(
    units.density(threshold),
  )} ${units.seedUnit}, year by year.`;
  const seeds = (v: number) => `${formatAmount(v)} ${units.seedUnit}`;
  const plants = (v: number) => `${formatAmount(v)} ${units.plantUnit}`;

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-x-6 gap-y-2 rounded-seed bg-silt-100 px-4 py-2 print:hidden">
        <ChartOption
          legend="Quantile bands on the comparison charts"
          label="Bands"
          value={bands}
          options={bandOptions}
          onChange={setBands}
        />
        <ChartOption
          legend="Scale of the seedbank chart"
          label="Seedbank scale"
          value={scale}
          options={scaleOptions}
          onChange={setScale}
        />
        <p className="text-xs text-loam-700">
          Hover a chart to read each line's value in a year; the summary table and each projection's page hold
          every number.
        </p>
      </div>
      <div className="grid gap-6 xl:grid-cols-2">
        <ChartFrame
          className="xl:col-span-2"
          title={`Seedbank, total (${units.seedUnit})`}
          exportSubtitle={subtitle}
          filename={`${stem}-seedbank`}
          lead={
            scale === 'log'
              ? 'Median seedbank of each strategy on a log scale, where equal distances are equal ratios: halving from 10,000 to 5,000 falls as far as from 1,000 to 500.'
              : 'Median seedbank of each strategy.'
          }
        >
          <BandChart
            title={`Seedbank of each strategy, in ${units.seedUnit}`}
            summary={describe(
              compared,
              'Median seedbank',
              (s) => s.series.seedbankTotal.q50.map(units.density),
              seeds,
            )}
            x={x}
            series={lines((s) => s.series.seedbankTotal, units.density)}
            yLabel={scale === 'log' ? `${units.seedUnit} (log scale)` : units.seedUnit}
            formatValue={seeds}
            scale={scale}
            bandLegend={legend}
            height={320}
          />
        </ChartFrame>
        {plantCharts.map((c) => (
          <ChartFrame
            key={c.series}
            title={`${c.name} (${units.plantUnit})`}
            exportSubtitle={subtitle}
            filename={`${stem}-${c.series}`}
            lead={c.lead}
          >
            <BandChart
              title={`${c.name} of each strategy, in ${units.plantUnit}`}
              summary={describe(
                compared,
                `Median ${c.name.toLowerCase()}`,
                (s) => s.series[c.series].q50.map(units.density),
                plants,
              )}
              x={x}
              series={lines((s) => s.series[c.series], units.density)}
              yLabel={units.plantUnit}
              formatValue={plants}
              bandLegend={legend}
              height={320}
            />
          </ChartFrame>
        ))}
        <ChartFrame
          title="Probability of depletion"
          exportSubtitle={subtitle}
          filename={`${stem}-depletion`}
          lead={
            compared.every((c) => c.projection.result.summary.depletionProbability.every((p) => p === 0))
              ? `${depletionLead} Here no replicate of any strategy gets below it within the horizon, so every line lies on 0 %.`
              : depletionLead
          }
        >
          <BandChart
            title="Probability of depletion of each strategy, by year"
            summary={describe(
              compared,
              'Probability of depletion',
              (s) => s.depletionProbability,
              (v) => formatPercent(v),
            )}
            x={x}
            series={compared.map((c) => ({
              id: c.projection.id,
              label: c.projection.label,
              style: c.style,
              values: c.projection.result.summary.depletionProbability,
            }))}
            yLabel="Replicates depleted"
            formatValue={(v) => formatPercent(v)}
            formatTick={(v) => formatPercent(v)}
            yDomain={[0, 1]}
            curve="step"
            height={320}
          />
        </ChartFrame>
        <ChartFrame
          title={`Cumulative cost (per ${units.area})`}
          exportSubtitle={subtitle}
          filename={`${stem}-cost`}
          lead="Money spent on the steps so far, per unit of field area, undiscounted."
        >
          <BandChart
            title={`Cumulative cost of each strategy, per ${units.area}`}
            summary={describe(
              compared,
              'Median cumulative cost',
              (s) => s.economics.cumulativeCostPerHa.q50.map(units.money),
              (v) => `${formatMoney(v)} per ${units.area}`,
            )}
            x={x}
            series={lines((s) => s.economics.cumulativeCostPerHa, units.money)}
            yLabel={`Cost per ${units.area}`}
            formatValue={(v) => `${formatMoney(v)} per ${units.area}`}
            bandLegend={legend}
            height={320}
          />
        </ChartFrame>
      </div>
    </div>
  );
}
