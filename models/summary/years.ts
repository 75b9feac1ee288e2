import { quantileSorted } from './quantile';
import { sortedYearColumn, toReplicateYearTable, type ReplicateYearValues } from './table';

/** Quantile levels shown by default: the 90 % band, the interquartile range and the median. */
export const DEFAULT_PROBABILITIES: readonly number[] = [0.05, 0.25, 0.5, 0.75, 0.95];

export interface YearSummaryOptions {
  /** Quantile levels in [0, 1]; defaults to DEFAULT_PROBABILITIES. */
  readonly probabilities?: readonly number[];
  /** When given, each year reports the share of replicates strictly below it (e.g. 1 seed/m²). */
  readonly threshold?: number;
}

export interface QuantileValue {
  readonly probability: number;
  /** Type-7 (R default) quantile across replicates; see quantileSorted. */
  readonly value: number;
}

export interface YearSummary {
  /** Year index: 0 is the initial census. */
  readonly year: number;
  readonly mean: number;
  /** Sample standard deviation (divisor n − 1); null with a single replicate. */
  readonly sd: number | null;
  readonly quantiles: readonly QuantileValue[];
  /** Share of replicates with value < threshold ("functionally depleted"); null without a threshold. */
  readonly probabilityBelow: number | null;
}

/**
 * Across-replicate statistics per year. Each year's column is copied into one reused Float64Array and
 * sorted once; quantiles and the below-threshold share (binary search) then cost O(log n), so
 * 10,000 replicates × 50 years is 50 typed-array sorts.
 */
export function summarizeYears(values: ReplicateYearValues, options: YearSummaryOptions = {}): YearSummary[] {
  const table = toReplicateYearTable(values);
  const probabilities = options.probabilities ?? DEFAULT_PROBABILITIES;
  for (const p of probabilities) {
    if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile probability must be in [0, 1], got ${p}`);
  }
  const { threshold } = options;
  if (threshold !== undefined && !Number.isFinite(threshold)) {
    throw new RangeError(`threshold must be a finite number, got ${threshold}`);
  }
  const n = table.replicateCount;
  const column = new Float64Array(n);
  const summaries: YearSummary[] = [];
  for (let year = 0; year < table.yearCount; year++) {
    const sorted = sortedYearColumn(table, year, column);
    let total = 0;
    for (let r = 0; r < n; r++) total += sorted[r];
    const mean = total / n;
    // Two-pass variance: stable when values are large (10^8 seeds) and the spread is small.
    let squares = 0;
    for (let r = 0; r < n; r++) squares += (sorted[r] - mean) ** 2;
    summaries.push({
      year,
      mean,
      sd: n > 1 ? Math.sqrt(squares / (n - 1)) : null,
      quantiles: probabilities.map((probability) => ({
        probability,
        value: quantileSorted(sorted, probability),
      })),
      probabilityBelow: threshold === undefined ? null : countBelow(sorted, threshold) / n,
    });
  }
  return summaries;
}

/** Number of entries strictly below `limit` in ascending data (lower-bound binary search). */
function countBelow(sorted: Float64Array, limit: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] < limit) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
