import { baselineStyle, strategyStyles, type SeriesStyle } from '../../shared/charts/palette';
import type { CsvCell } from '../../shared/lib/csv';
import type { DisplayUnits } from './display';
import { inDisplayOrder, isFinished, type FinishedProjection } from './result';
import type { ProjectionView } from '../../../../shared/api/projections';

/*
 * The numbers of a comparison: one row per strategy and one for No control, each read
 * from its projection's summary. All projections of a launch share the seed, so their
 * differences come from the strategies, not from chance.
 */

export type Compared = { projection: FinishedProjection; style: SeriesStyle };

/** Strategies in the batch's order, each with its line style, then No control. The let-it-seed run has its own view. */
export function comparedProjections(views: readonly ProjectionView[]): Compared[] {
  const ordered = inDisplayOrder(views).filter((v) => v.role !== 'let-it-seed');
  let next = 0;
  return ordered.flatMap((v) => {
    const style = v.role === 'baseline' ? baselineStyle : strategyStyles[next++ % strategyStyles.length];
    return isFinished(v) ? [{ projection: v, style }] : [];
  });
}

/** Years the table reports the seedbank at: 5 and 10, or the horizon when it is shorter, and the horizon. */
export function checkpointYears(horizon: number): number[] {
  return [...new Set([5, 10, horizon].map((y) => Math.min(y, horizon)))].sort((a, b) => a - b);
}

export type SummaryRow = {
  id: string;
  label: string;
  role: ProjectionView['role'];
  style: SeriesStyle;
  seedbank: { year: number; median: number; q05: number; q95: number }[];
  depletionAtHorizon: number;
  /** Median years to a 90 % decline; null when fewer than half the replicates get there. */
  declineYears: number | null;
  declineReached: number;
  cumulativeCost: number;
  /** Mean over years 1..H of the mean yearly yield loss. */
  yieldLossPercent: number;
  npv: { median: number; q05: number; q95: number; mean: number };
  /** Mean NPV minus No control's mean NPV (the mean of the paired difference); null for No control itself. */
  npvVsNoControl: number | null;
};

export function summaryRows(compared: readonly Compared[], units: DisplayUnits): SummaryRow[] {
  const baseline = compared.find((c) => c.projection.role === 'baseline');
  const baselineNpv = baseline?.projection.result.summary.economics.npvPerHa.mean;
  return compared.map(({ projection, style }) => {
    const s = projection.result.summary;
    const H = s.horizonYears;
    const total = s.series.seedbankTotal;
    const decline = s.decline.find((d) => d.fraction === 0.9);
    const loss = s.economics.yieldLossPercent.mean.slice(1);
    const npv = s.economics.npvPerHa;
    return {
      id: projection.id,
      label: projection.label,
      role: projection.role,
      style,
      seedbank: checkpointYears(H).map((year) => ({
        year,
        median: units.density(total.q50[year]),
        q05: units.density(total.q05[year]),
        q95: units.density(total.q95[year]),
      })),
      depletionAtHorizon: s.depletionProbability[H],
      declineYears: decline?.medianYears ?? null,
      declineReached: decline?.proportionReached ?? 0,
      cumulativeCost: units.money(s.economics.cumulativeCostPerHa.q50[H]),
      yieldLossPercent: loss.length ? loss.reduce((a, b) => a + b, 0) / loss.length : 0,
      npv: {
        median: units.money(npv.q50),
        q05: units.money(npv.q05),
        q95: units.money(npv.q95),
        mean: units.money(npv.mean),
      },
      npvVsNoControl:
        projection.role === 'baseline' || baselineNpv === undefined
          ? null
          : units.money(npv.mean - baselineNpv),
    };
  });
}

/** The summary table as tidy CSV: one row per projection, units in the column names. */
export function summaryCsv(rows: readonly SummaryRow[], units: DisplayUnits, horizon: number) {
  const years = checkpointYears(horizon);
  const money = `per ${units.area}`;
  const header = [
    'strategy',
    'role',
    ...years.flatMap((y) => [
      `seedbankYear${y}Median (${units.seedUnit})`,
      `seedbankYear${y}Q05 (${units.seedUnit})`,
      `seedbankYear${y}Q95 (${units.seedUnit})`,
    ]),
    `depletionProbabilityYear${horizon}`,
    'yearsTo90PercentDeclineMedian',
    'shareReaching90PercentDecline',
    `cumulativeCostMedian (${money})`,
    'yieldLossAverageYear (%)',
    `npvMedian (${money})`,
    `npvQ05 (${money})`,
    `npvQ95 (${money})`,
    `npvMean (${money})`,
    `npvVsNoControlMean (${money})`,
  ];
  const body: CsvCell[][] = rows.map((r) => [
    r.label,
    r.role,
    ...r.seedbank.flatMap((b) => [b.median, b.q05, b.q95]),
    r.depletionAtHorizon,
    r.declineYears,
    r.declineReached,
    r.cumulativeCost,
    r.yieldLossPercent,
    r.npv.median,
    r.npv.q05,
    r.npv.q95,
    r.npv.mean,
    r.npvVsNoControl,
  ]);
  return { header, body };
}
