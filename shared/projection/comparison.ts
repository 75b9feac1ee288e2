// The numbers of a comparison — one row per strategy and one for No control — read from
// each projection's summary. Shared by the comparison page and the printed report so the
// two can never disagree. Values are metric (per m², per ha); callers convert for display.
import type { ProjectionSummary } from '../../models/projection/summarise';

export type ComparedRun = {
  id: string;
  label: string;
  role: 'strategy' | 'baseline' | 'let-it-seed';
  summary: ProjectionSummary;
};

export type ComparisonRow = {
  id: string;
  label: string;
  role: ComparedRun['role'];
  /** Seedbank (seeds/m²) median and 90 % band at each checkpoint year. */
  seedbank: { year: number; median: number; q05: number; q95: number }[];
  depletionAtHorizon: number;
  /** Median years to a 90 % decline; null when fewer than half the replicates get there. */
  declineYears: number | null;
  /** Share of replicates reaching a 90 % decline within the horizon. */
  declineReached: number;
  /** Median cumulative cost over the horizon (currency/ha). */
  cumulativeCost: number;
  /** Mean over years 1..H of the mean yearly yield loss (%). */
  yieldLossPercent: number;
  npv: { mean: number; median: number; q05: number; q95: number };
  /** Mean NPV minus No control's mean NPV (currency/ha); null for No control itself. */
  npvVsNoControl: number | null;
};

/** Years the table reports the seedbank at: 5 and 10 (or the horizon when shorter), and the horizon. */
export function checkpointYears(horizon: number): number[] {
  return [...new Set([5, 10, horizon].map((y) => Math.min(y, horizon)))].sort((a, b) => a - b);
}

export function comparisonRows(runs: readonly ComparedRun[]): ComparisonRow[] {
  const baseline = runs.find((r) => r.role === 'baseline');
  const baselineNpv = baseline?.summary.economics.npvPerHa.mean;
  return runs.map(({ id, label, role, summary: s }) => {
    const H = s.horizonYears;
    const total = s.series.seedbankTotal;
    const loss = s.economics.yieldLossPercent.mean.slice(1);
    const npv = s.economics.npvPerHa;
    const decline = s.decline.find((d) => d.fraction === 0.9);
    return {
      id,
      label,
      role,
      seedbank: checkpointYears(H).map((year) => ({
        year,
        median: total.q50[year],
        q05: total.q05[year],
        q95: total.q95[year],
      })),
      depletionAtHorizon: s.depletionProbability[H],
      declineYears: decline?.medianYears ?? null,
      declineReached: decline?.proportionReached ?? 0,
      cumulativeCost: s.economics.cumulativeCostPerHa.q50[H],
      yieldLossPercent: loss.length ? loss.reduce((a, b) => a + b, 0) / loss.length : 0,
      npv: { mean: npv.mean, median: npv.q50, q05: npv.q05, q95: npv.q95 },
      npvVsNoControl: role === 'baseline' || baselineNpv === undefined ? null : npv.mean - baselineNpv,
    };
  });
}

/**
 * "What letting it seed costs": the let-it-seed run against the same strategy run
 * normally, both from one seed — extra seedbank by year and the NPV lost (currency/ha).
 */
export function letItSeedPayoff(plain: ProjectionSummary, letIt: ProjectionSummary) {
  const extra = letIt.series.seedbankTotal.mean.map((v, t) => v - plain.series.seedbankTotal.mean[t]);
  return {
    extraSeedbank: extra,
    extraAtHorizon: extra[extra.length - 1],
    npvCost: plain.economics.npvPerHa.mean - letIt.economics.npvPerHa.mean,
  };
}
