import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { requireAlpha } from './checks';
import type { RcbdAnova } from './rcbd-anova';

/**
 * Fisher's least significant difference between two treatment means each over r plots:
 *     LSD = t(1 − α/2; df_error) · √(2·MS_error / r)
 * (Fisher 1935, The Design of Experiments; the usual agronomy form, e.g. Gomez & Gomez 1984 ch. 5).
 */
export function fisherLsd(mse: number, dfError: number, replicates: number, alpha = 0.05): number {
  if (!(Number.isFinite(mse) && mse >= 0)) throw new RangeError(`error mean square must be ≥ 0, got ${mse}`);
  if (!(Number.isInteger(dfError) && dfError >= 1))
    throw new RangeError(`error df must be a whole number ≥ 1, got ${dfError}`);
  if (!(Number.isInteger(replicates) && replicates >= 1)) {
    throw new RangeError(`replicates must be a whole number ≥ 1, got ${replicates}`);
  }
  requireAlpha(alpha, 'LSD significance level');
  return tQuantile(1 - alpha / 2, dfError) * Math.sqrt((2 * mse) / replicates);
}

export interface PairwiseComparison {
  a: string;
  b: string;
  /** mean(a) − mean(b). */
  difference: number;
  /** |difference| > LSD. */
  significant: boolean;
}

export interface LsdComparisons {
  method: "Fisher's LSD";
  alpha: number;
  lsd: number;
  /**
   * Whether the treatment F test is significant at the same α. Fisher's protected LSD reads the
   * pairwise differences only when it is; they are listed either way so a page can say so.
   */
  fTestSignificant: boolean;
  /** Every pair once, in treatment order (a before b). */
  comparisons: PairwiseComparison[];
}

export function lsdComparisons(anova: RcbdAnova, alpha = 0.05): LsdComparisons {
  const mse = anova.errorRow.ms as number;
  const lsd = fisherLsd(mse, anova.errorRow.df, anova.blocks.length, alpha);
  const comparisons: PairwiseComparison[] = [];
  for (let i = 0; i < anova.treatments.length; i++) {
    for (let j = i + 1; j < anova.treatments.length; j++) {
      const difference = anova.means[i] - anova.means[j];
      comparisons.push({
        a: anova.treatments[i],
        b: anova.treatments[j],
        difference,
        significant: Math.abs(difference) > lsd,
      });
    }
  }
  const p = anova.treatmentsRow.p;
  return { method: "Fisher's LSD", alpha, lsd, fTestSignificant: p !== null && p < alpha, comparisons };
}
