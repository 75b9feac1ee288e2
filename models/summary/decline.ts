import { quantileSorted } from './quantile';
import { meanTrajectory, toReplicateYearTable, type ReplicateYearValues } from './table';

/** Declines reported by default: 90 % and 99 % below the year-0 value. */
export const DEFAULT_DECLINE_FRACTIONS: readonly number[] = [0.9, 0.99];

/**
 * Relative slack on the comparison so that an exact 90 % decline counts: 1 − 0.9 is not exactly 0.1
 * in binary floating point, and x0·(1 − f) can land a rounding step below x0/10.
 */
const DECLINE_SLACK = 1e-12;

/**
 * Years until a trajectory has declined by `fraction` relative to year 0: the first year t ≥ 1 with
 * x_t ≤ (1 − fraction)·x_0. null when that never happens within the trajectory (the horizon), or
 * when x_0 ≤ 0 (nothing to decline from). Later rebounds do not undo it: this is the first passage.
 */
export function yearsUntilDecline(trajectory: ArrayLike<number>, fraction: number): number | null {
  assertFraction(fraction);
  const start = trajectory[0];
  if (!(start > 0)) return null;
  const limit = (1 - fraction) * start * (1 + DECLINE_SLACK);
  for (let t = 1; t < trajectory.length; t++) {
    if (trajectory[t] <= limit) return t;
  }
  return null;
}

export interface DeclineSummary {
  /** The decline, e.g. 0.9 for "90 % below year 0". */
  readonly fraction: number;
  /**
   * Median over replicates of yearsUntilDecline (type-7 median). Replicates that do not get there
   * within the horizon (or start at 0) count as "later than the horizon", so the median is a number
   * exactly when more than half of the replicates get there, and null otherwise. May end in .5 for
   * an even replicate count (mean of the middle two).
   */
  readonly medianYears: number | null;
  /** yearsUntilDecline of the across-replicate mean trajectory. */
  readonly meanTrajectoryYears: number | null;
  /** Share of replicates that reach the decline within the horizon. */
  readonly proportionReached: number;
}

export function summarizeDecline(
  values: ReplicateYearValues,
  fractions: readonly number[] = DEFAULT_DECLINE_FRACTIONS,
): DeclineSummary[] {
  const table = toReplicateYearTable(values);
  const { data, replicateCount, yearCount } = table;
  const mean = meanTrajectory(table);
  return fractions.map((fraction) => {
    const years = new Float64Array(replicateCount);
    let reached = 0;
    for (let r = 0; r < replicateCount; r++) {
      const t = yearsUntilDecline(data.subarray(r * yearCount, (r + 1) * yearCount), fraction);
      years[r] = t ?? Infinity;
      if (t !== null) reached++;
    }
    const median = quantileSorted(years.sort(), 0.5);
    return {
      fraction,
      medianYears: Number.isFinite(median) ? median : null,
      meanTrajectoryYears: yearsUntilDecline(mean, fraction),
      proportionReached: reached / replicateCount,
    };
  });
}

function assertFraction(fraction: number): void {
  if (!(fraction > 0 && fraction < 1)) {
    throw new RangeError(`decline fraction must be in (0, 1) (0.9 = 90 %), got ${fraction}`);
  }
}
