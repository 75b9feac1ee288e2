import { useState } from 'react';
import { BandChart, type ChartSeries } from '../../shared/charts/BandChart';
import { ChartFrame } from '../../shared/charts/ChartFrame';
import { ChartOption } from '../../shared/charts/ChartOption';
import { meanFieldStyle, measureStyles, type SeriesStyle } from '../../shared/charts/palette';
import { ProbabilityBars } from '../../shared/charts/ProbabilityBars';
import { formatAmount, formatPercent, useDisplayUnits } from './display';
import { bandLegend, bandSeries, describeSeries } from './chartSeries';
import type { FinishedProjection } from './result';
import type { SeriesName } from '../../../../models/projection/trajectories';

type Scale = 'linear' | 'log';

const scaleOptions = [
  { value: 'linear', label: 'Linear' },
  { value: 'log', label: 'Log' },
] as const;

/** The mean-field layer of one series: the same program with expected values, no chance. */
function meanFieldSeries(
  id: string,
  label: string,
  values: number[],
  convert: (v: number) => number,
): ChartSeries {
  return { id: `${id}-mf`, label, style: meanFieldStyle, values: values.map(convert) };
}

/** The charts of one projection: seedbank (total and by layer), plants, depletion odds. */
export function ProjectionCharts({
  projection,
  subtitle,
}: {
  projection: FinishedProjection;
  subtitle: string;
}) {
  const units = useDisplayUnits();
  const [totalScale, setTotalScale] = useState<Scale>('linear');
  const [layerScale, setLayerScale] = useState<Scale>('linear');
  const { summary, meanField } = projection.result;
  const x = summary.years;
  const d = units.density;
  const s = summary.series;
  const stem = `${projection.label}-seed-${projection.seed}`;

  const chart = (name: SeriesName, label: string, style: SeriesStyle) => [
    bandSeries(name, `${label}, median`, style, s[name], d),
    meanFieldSeries(name, 'Mean field (no chance)', meanField[name], d),
  ];

  const scaleControl = (what: string, value: Scale, onChange: (next: Scale) => void) => (
    <ChartOption
      legend={`Scale of the ${what} chart`}
      label="Scale"
      value={value}
      options={scaleOptions}
      onChange={onChange}
    />
  );

  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <ChartFrame
        className="lg:col-span-2"
        title={`Seedbank, total (${units.seedUnit})`}
        exportSubtitle={subtitle}
        filename={`${stem}-seedbank`}
        lead="Viable seeds in the soil at each yearly census: the line is the median of the replicates, the shading their spread."
        controls={scaleControl('total seedbank', totalScale, setTotalScale)}
      >
        <BandChart
          title={`Seedbank, total, in ${units.seedUnit}`}
          summary={describeSeries('Total seedbank', units.seedUnit, s.seedbankTotal, d)}
          x={x}
          series={chart('seedbankTotal', 'Seedbank', measureStyles.seedbankTotal)}
          yLabel={units.seedUnit}
          formatValue={(v) => `${formatAmount(v)} ${units.seedUnit}`}
          scale={totalScale}
          bandLegend={bandLegend}
        />
      </ChartFrame>
      <ChartFrame
        title={`Seedbank by layer (${units.seedUnit})`}
        exportSubtitle={subtitle}
        filename={`${stem}-seedbank-layers`}
        lead="The shallow layer, where seeds can emerge, and the deep layer below it."
        controls={scaleControl('seedbank by layer', layerScale, setLayerScale)}
      >
        <BandChart
          title={`Seedbank by layer, in ${units.seedUnit}`}
          summary={`${describeSeries('Shallow layer', units.seedUnit, s.seedbankShallow, d)} ${describeSeries('Deep layer', units.seedUnit, s.seedbankDeep, d)}`}
          x={x}
          series={[
            bandSeries(
              'shallow',
              'Shallow layer, median',
              measureStyles.seedbankShallow,
              s.seedbankShallow,
              d,
            ),
            bandSeries('deep', 'Deep layer, median', measureStyles.seedbankDeep, s.seedbankDeep, d),
            {
              id: 'shallow-mf',
              label: 'Shallow, mean field',
              style: { ...meanFieldStyle, color: measureStyles.seedbankShallow.color, dash: '2 3' },
              values: meanField.seedbankShallow.map(d),
            },
            {
              id: 'deep-mf',
              label: 'Deep, mean field',
              style: { ...meanFieldStyle, color: measureStyles.seedbankDeep.color, dash: '2 3' },
              values: meanField.seedbankDeep.map(d),
            },
          ]}
          yLabel={units.seedUnit}
          formatValue={(v) => `${formatAmount(v)} ${units.seedUnit}`}
          scale={layerScale}
          bandLegend={bandLegend}
        />
      </ChartFrame>
      <ChartFrame
        title="Probability of depletion"
        exportSubtitle={subtitle}
        filename={`${stem}-depletion`}
        lead={`Share of replicates whose seedbank is below the depletion threshold of ${formatAmount(
          d(projection.snapshot.depletionThreshold),
        )} ${units.seedUnit} in each year.`}
      >
        <ProbabilityBars
          title="Probability of depletion by year"
          summary={`Probability that the seedbank is depleted: ${formatPercent(
            summary.depletionProbability[summary.depletionProbability.length - 1],
          )} in year ${summary.horizonYears}.`}
          x={x}
          values={summary.depletionProbability}
          color={measureStyles.depletion.color}
          yLabel="Replicates depleted"
        />
      </ChartFrame>
      <ChartFrame
        title={`Established plants (${units.plantUnit})`}
        exportSubtitle={subtitle}
        filename={`${stem}-established`}
        lead="Plants past the seedling stage at each census (rosettes and older)."
      >
        <BandChart
          title={`Established plants, in ${units.plantUnit}`}
          summary={describeSeries('Established plants', units.plantUnit, s.established, d)}
          x={x}
          series={chart('established', 'Established', measureStyles.established)}
          yLabel={units.plantUnit}
          formatValue={(v) => `${formatAmount(v)} ${units.plantUnit}`}
          bandLegend={bandLegend}
        />
      </ChartFrame>
      <ChartFrame
        title={`Flowering plants (${units.plantUnit})`}
        exportSubtitle={subtitle}
        filename={`${stem}-flowering`}
        lead="Plants that flowered in the year: the ones that can set seed."
      >
        <BandChart
          title={`Flowering plants, in ${units.plantUnit}`}
          summary={describeSeries('Flowering plants', units.plantUnit, s.flowering, d)}
          x={x}
          series={chart('flowering', 'Flowering', measureStyles.flowering)}
          yLabel={units.plantUnit}
          formatValue={(v) => `${formatAmount(v)} ${units.plantUnit}`}
          bandLegend={bandLegend}
        />
      </ChartFrame>
    </div>
  );
}
