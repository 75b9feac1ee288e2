import type { ReactNode } from 'react';
import { BandChart, type ChartSeries } from '../../../shared/charts/BandChart';
import { ChartFrame } from '../../../shared/charts/ChartFrame';
import { strategyStyles } from '../../../shared/charts/palette';
import type { ReplayResponse } from '../../../../../shared/api/lessons';
import { conversion, formatNumber } from '../../../shared/lib/parameterDraft';
import { useUnits } from '../../../shared/lib/units';
import { yearsOf, type ComputedRun } from '../useLessonRuns';

type Measure = 'seedbankTotal' | 'established';

const measures: Record<Measure, { what: string; unit: string }> = {
  seedbankTotal: { what: 'Seedbank', unit: 'seeds/m²' },
  established: { what: 'Established plants', unit: 'plants/m²' },
};

type RunChartProps = {
  title: string;
  /** What the chart shows, read out in place of the drawing. */
  summary: string;
  runs: readonly ComputedRun[];
  horizonYears: number;
  measure?: Measure;
  scale?: 'linear' | 'log';
  /** A replay made at the current slider values, whose bands are drawn behind the lines. */
  replay: ReplayResponse | null;
  large?: boolean;
  controls?: ReactNode;
};

/**
 * The lesson's runs over the years: the browser's mean-field line for each, and, after a
 * replay, the 25–75 % and 5–95 % bands of the replicates. The exact yearly values (metric)
 * ride on the figure as data attributes for anyone who wants the numbers behind it.
 */
export function RunChart({
  title,
  summary,
  runs,
  horizonYears,
  measure = 'seedbankTotal',
  scale = 'linear',
  replay,
  large = false,
  controls,
}: RunChartProps) {
  const { system } = useUnits();
  const m = measures[measure];
  const c = conversion(m.unit, system);
  const shown = (values: ArrayLike<number>) => Array.from(values, c.toShown);
  const series: ChartSeries[] = runs.map((run, i) => {
    const band = replay?.runs.find((r) => r.id === run.id)?.[measure];
    return {
      id: run.id,
      label: run.label,
      style: strategyStyles[i % strategyStyles.length],
      values: shown(run.meanField[measure]),
      ...(band
        ? {
            inner: { low: shown(band.q25), high: shown(band.q75) },
            outer: { low: shown(band.q05), high: shown(band.q95) },
          }
        : {}),
    };
  });
  const numbers = Object.fromEntries(runs.map((run) => [run.id, Array.from(run.meanField[measure])]));
  return (
    <ChartFrame title={title} lead={summary} controls={controls} headingLevel="h3">
      <div data-lesson-chart={measure} data-mean-field={JSON.stringify(numbers)}>
        <BandChart
          title={title}
          summary={summary}
          x={yearsOf(horizonYears)}
          series={series}
          yLabel={`${m.what} (${c.unit})`}
          formatValue={(v) => `${formatNumber(v, v < 10 ? 2 : 0)} ${c.unit}`}
          scale={scale}
          height={large ? 420 : 300}
          bandLegend={
            replay ? { inner: 'Middle half of the replays', outer: '90 % of the replays' } : undefined
          }
        />
      </div>
    </ChartFrame>
  );
}
