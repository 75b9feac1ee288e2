import type { SeriesSummary } from '../../../../models/projection/summarise';
import type { ChartSeries } from '../../shared/charts/BandChart';
import type { SeriesStyle } from '../../shared/charts/palette';
import { formatAmount } from './display';

export type Bands = 'both' | 'inner' | 'outer' | 'none';

/** A summary series as a chart line with its quantile bands, in display units. */
export function bandSeries(
  id: string,
  label: string,
  style: SeriesStyle,
  s: SeriesSummary,
  convert: (v: number) => number,
  bands: Bands = 'both',
): ChartSeries {
  const c = (values: readonly number[]) => values.map(convert);
  return {
    id,
    label,
    style,
    values: c(s.q50),
    inner: bands === 'both' || bands === 'inner' ? { low: c(s.q25), high: c(s.q75) } : undefined,
    outer: bands === 'both' || bands === 'outer' ? { low: c(s.q05), high: c(s.q95) } : undefined,
  };
}

export const bandLegend = {
  inner: 'Middle 50 % of replicates (25–75 %)',
  outer: '90 % of replicates (5–95 %)',
};

/** A sentence for screen readers: where the median starts and ends, and the 90 % band at the end. */
export function describeSeries(
  label: string,
  unit: string,
  s: SeriesSummary,
  convert: (v: number) => number,
): string {
  const last = s.q50.length - 1;
  return `${label}: median ${formatAmount(convert(s.q50[0]))} ${unit} at the start and ${formatAmount(
    convert(s.q50[last]),
  )} ${unit} in year ${last}, with 90 % of replicates between ${formatAmount(convert(s.q05[last]))} and ${formatAmount(
    convert(s.q95[last]),
  )}.`;
}
