// Across-replicate summary of a projection: per-year mean, SD and quantiles of every
// series, depletion probability, years to 90 % and 99 % decline of the seedbank,
// economics, and the seed and input snapshot that reproduce it.
import type { Scenario } from '../scenario/types';
import { summarizeYears } from '../summary/years';
import { summarizeDecline } from '../summary/decline';
import type { DeclineSummary } from '../summary/decline';
import type { ReplicateYearTable } from '../summary/table';
import { replicateEconomics } from './economics';
import { seriesNames, seriesUnits } from './trajectories';
import type { ReplicateBlock, SeriesName } from './trajectories';

export interface SeriesSummary {
  readonly unit: string;
  readonly mean: number[];
  /** null with a single replicate. */
  readonly sd: (number | null)[];
  readonly q05: number[];
  readonly q25: number[];
  readonly q50: number[];
  readonly q75: number[];
  readonly q95: number[];
}

export interface ProjectionSummary {
  readonly seed: number;
  readonly replicates: number;
  readonly horizonYears: number;
  /** 0..horizon; 0 is the first census. */
  readonly years: number[];
  readonly series: Record<SeriesName, SeriesSummary>;
  /** Share of replicates whose seedbank is below the depletion threshold, by year. */
  readonly depletionProbability: number[];
  /** Seedbank (total) decline by 90 % and 99 % from year 0. */
  readonly decline: DeclineSummary[];
  readonly economics: {
    readonly yieldLossPercent: SeriesSummary;
    readonly netValuePerHa: SeriesSummary;
    readonly cumulativeCostPerHa: SeriesSummary;
    /** Net present value per ha over the horizon, across replicates (one "year"). */
    readonly npvPerHa: {
      readonly unit: string;
      readonly mean: number;
      readonly sd: number | null;
      readonly q05: number;
      readonly q25: number;
      readonly q50: number;
      readonly q75: number;
      readonly q95: number;
    };
  };
  /** The validated inputs that produced this result. */
  readonly scenario: Scenario;
}

function table(data: Float64Array, replicateCount: number, yearCount: number): ReplicateYearTable {
  return { data, replicateCount, yearCount };
}

function summariseSeries(data: Float64Array, replicates: number, years: number, unit: string): SeriesSummary {
  const rows = summarizeYears(table(data, replicates, years + 1));
  const q = (k: number) => rows.map((row) => row.quantiles[k].value);
  return {
    unit,
    mean: rows.map((r) => r.mean),
    sd: rows.map((r) => r.sd),
    q05: q(0),
    q25: q(1),
    q50: q(2),
    q75: q(3),
    q95: q(4),
  };
}

export function summarise(scenario: Scenario, trajectories: ReplicateBlock): ProjectionSummary {
  const R = trajectories.toReplicate - trajectories.fromReplicate;
  const H = trajectories.years;
  const series = {} as Record<SeriesName, SeriesSummary>;
  for (const name of seriesNames)
    series[name] = summariseSeries(trajectories.series[name], R, H, seriesUnits[name]);
  const seedbank = table(trajectories.series.seedbankTotal, R, H + 1);
  const depletion = summarizeYears(seedbank, { threshold: scenario.depletionThreshold, probabilities: [] });
  const econ = replicateEconomics(scenario, trajectories);
  const npv = summariseSeries(econ.npvPerHa, R, 0, 'currency/ha');
  return {
    seed: scenario.seed,
    replicates: R,
    horizonYears: H,
    years: Array.from({ length: H + 1 }, (_, t) => t),
    series,
    depletionProbability: depletion.map((row) => row.probabilityBelow as number),
    decline: summarizeDecline(seedbank),
    economics: {
      yieldLossPercent: summariseSeries(econ.yieldLossPercent, R, H, '%'),
      netValuePerHa: summariseSeries(econ.netValuePerHa, R, H, 'currency/ha'),
      cumulativeCostPerHa: summariseSeries(econ.cumulativeCostPerHa, R, H, 'currency/ha'),
      npvPerHa: {
        unit: npv.unit,
        mean: npv.mean[0],
        sd: npv.sd[0],
        q05: npv.q05[0],
        q25: npv.q25[0],
        q50: npv.q50[0],
        q75: npv.q75[0],
        q95: npv.q95[0],
      },
    },
    scenario,
  };
}
