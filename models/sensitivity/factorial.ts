// Main effects of a full factorial grid: the mean outcome at each level of a parameter,
// averaged over every combination of the other parameters' levels (a balanced grid, so each
// level mean has L^(k−1) points; Montgomery, Design and Analysis of Experiments, on factorial designs).
import type { SweepParameter } from './design';
import { assertFiniteOutcomes, assertOutcomeCount } from './outcomes';
import { factorialLevels } from './values';

export interface MainEffect {
  path: string;
  /** The parameter's level values, min to max. */
  levels: number[];
  /** Mean outcome at each level, same order. */
  means: number[];
  /** Largest minus smallest level mean: how far this parameter alone moves the average outcome. */
  range: number;
}

/**
 * outcomes[r] is the outcome of point r of designPoints(params, { kind: 'factorial', levels }, …),
 * whose level of parameter j is ⌊r / L^(k−1−j)⌋ mod L. Results in parameter order.
 */
export function mainEffects(
  params: readonly SweepParameter[],
  levels: number,
  outcomes: readonly number[],
): MainEffect[] {
  const k = params.length;
  assertOutcomeCount(outcomes, levels ** k, 'factorial');
  assertFiniteOutcomes(outcomes);
  return params.map((p, j) => {
    const stride = levels ** (k - 1 - j);
    const sums = new Array<number>(levels).fill(0);
    outcomes.forEach((y, r) => {
      sums[Math.floor(r / stride) % levels] += y;
    });
    const means = sums.map((s) => s / levels ** (k - 1));
    return {
      path: p.path,
      levels: factorialLevels(p, levels),
      means,
      range: Math.max(...means) - Math.min(...means),
    };
  });
}
