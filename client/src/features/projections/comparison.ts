import { baselineStyle, strategyStyles, type SeriesStyle } from '../../shared/charts/palette';
import type { CsvCell } from '../../shared/lib/csv';
import type { DisplayUnits } from './display';
import { inDisplayOrder, isFinished, type FinishedProjection } from './result';
import type { ProjectionView } from '../../../../shared/api/projections';
import { checkpointYears, comparisonRows } from '../../../../shared/projection/comparison';

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

/** The shared comparison numbers (also printed in the grower report), in display units. */
export function summaryRows(compared: readonly Compared[], units: DisplayUnits): SummaryRow[] {
  const rows = comparisonRows(
    compared.map(({ projection: p }) => ({
      id: p.id,
      label: p.label,
      role: p.role,
      summary: p.result.summary,
    })),
  );
  return rows.map((r, i) => ({
    ...r,
    style: compared[i].style,
    seedbank: r.seedbank.map((b) => ({
      year: b.year,
      median: units.density(b.median),
      q05: units.density(b.q05),
      q95: units.density(b.q95),
    })),
    cumulativeCost: units.money(r.cumulativeCost),
    npv: {
      median: units.money(r.npv.median),
      q05: units.money(r.npv.q05),
      q95: units.money(r.npv.q95),
      mean: units.money(r.npv.mean),
    },
    npvVsNoControl: r.npvVsNoControl === null ? null : units.money(r.npvVsNoControl),
  }));
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
