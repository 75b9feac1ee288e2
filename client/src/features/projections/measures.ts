import type { ProjectionSummary, SeriesSummary } from '../../../../models/projection/summarise';
import type { SeriesName } from '../../../../models/projection/trajectories';
import { formatAmount, formatMoney, type DisplayUnits } from './display';

/*
 * The yearly quantities a projection reports, with the words and units they are shown
 * in. One list serves the charts, the year table and its CSV, so a unit is written in
 * one place only.
 */

type Kind = 'seeds' | 'seedlings' | 'plants' | 'money' | 'percent';

export type Measure = {
  key: string;
  label: string;
  kind: Kind;
  series: (summary: ProjectionSummary) => SeriesSummary;
  /** The engine series with a mean-field counterpart, when there is one. */
  meanField?: SeriesName;
};

const fromSeries = (name: SeriesName) => (summary: ProjectionSummary) => summary.series[name];

export const measures: readonly Measure[] = [
  {
    key: 'seedbankTotal',
    label: 'Seedbank, total',
    kind: 'seeds',
    series: fromSeries('seedbankTotal'),
    meanField: 'seedbankTotal',
  },
  {
    key: 'seedbankShallow',
    label: 'Seedbank, shallow layer',
    kind: 'seeds',
    series: fromSeries('seedbankShallow'),
    meanField: 'seedbankShallow',
  },
  {
    key: 'seedbankDeep',
    label: 'Seedbank, deep layer',
    kind: 'seeds',
    series: fromSeries('seedbankDeep'),
    meanField: 'seedbankDeep',
  },
  {
    key: 'emerged',
    label: 'Emerged seedlings',
    kind: 'seedlings',
    series: fromSeries('emerged'),
    meanField: 'emerged',
  },
  {
    key: 'established',
    label: 'Established plants',
    kind: 'plants',
    series: fromSeries('established'),
    meanField: 'established',
  },
  {
    key: 'flowering',
    label: 'Flowering plants',
    kind: 'plants',
    series: fromSeries('flowering'),
    meanField: 'flowering',
  },
  {
    key: 'seedsProduced',
    label: 'Seeds produced',
    kind: 'seeds',
    series: fromSeries('seedsProduced'),
    meanField: 'seedsProduced',
  },
  {
    key: 'seedRain',
    label: 'Seed rain added to the seedbank',
    kind: 'seeds',
    series: fromSeries('seedRain'),
    meanField: 'seedRain',
  },
  {
    key: 'cumulativeCost',
    label: 'Cumulative cost',
    kind: 'money',
    series: (s) => s.economics.cumulativeCostPerHa,
  },
  {
    key: 'yieldLoss',
    label: 'Crop yield loss',
    kind: 'percent',
    series: (s) => s.economics.yieldLossPercent,
  },
  {
    key: 'netValue',
    label: 'Net value of the year',
    kind: 'money',
    series: (s) => s.economics.netValuePerHa,
  },
];

export const measureByKey = (key: string): Measure => measures.find((m) => m.key === key) ?? measures[0];

export function unitOf(kind: Kind, units: DisplayUnits): string {
  switch (kind) {
    case 'seeds':
      return units.seedUnit;
    case 'seedlings':
      return `seedlings/${units.smallArea}`;
    case 'plants':
      return units.plantUnit;
    case 'money':
      return `per ${units.area}`;
    case 'percent':
      return '%';
  }
}

/** From the engine's metric value to the value shown. */
export function converter(kind: Kind, units: DisplayUnits): (value: number) => number {
  if (kind === 'money') return units.money;
  if (kind === 'percent') return (v) => v;
  return units.density;
}

export function formatterOf(kind: Kind): (value: number) => string {
  return kind === 'money' ? formatMoney : formatAmount;
}
