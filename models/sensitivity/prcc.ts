// Partial rank correlation coefficients (PRCC) of an outcome with each parameter of a sample,
// e.g. a Latin hypercube (Marino, Hogue, Ray & Kirschner 2008, J. Theor. Biol. 254:178–196):
// rank-transform the inputs and the outcome, regress the ranks of the parameter and of the
// outcome on the ranks of all the other parameters (with an intercept), and correlate the two
// residuals. It measures how monotone the outcome is in one parameter once the others' linear
// (in ranks) effects are taken out.
import tCdf from '@stdlib/stats-base-dists-t-cdf';
import type { SweepParameter } from './design';
import { pearson } from './correlation';
import { assertFiniteOutcomes } from './outcomes';
import { midranks } from './ranks';
import { orthonormalBasis, residualsOn } from './residuals';

export interface PrccEntry {
  path: string;
  /** PRCC in [−1, 1]; NaN when a residual has no spread (e.g. a constant outcome). */
  coefficient: number;
  /** t = r·√(df / (1 − r²)), ±Infinity for |r| = 1. */
  t: number;
  /** N − 2 − p with p = k − 1, the number of parameters regressed out. */
  degreesOfFreedom: number;
  /** Two-sided p-value of r = 0 from Student's t with that many degrees of freedom. */
  pValue: number;
}

/** Spearman's rank correlation: Pearson's on midranks (ties share their mean rank); NaN if either is constant. */
export function spearman(x: readonly number[], y: readonly number[]): number {
  return pearson(midranks(x), midranks(y));
}

/**
 * PRCC of outcomes[i] with each column of inputs[i] (row i = point i, columns in params' order),
 * in parameter order. Needs N ≥ k + 2 points so that at least one degree of freedom is left.
 */
export function prcc(
  params: readonly SweepParameter[],
  inputs: readonly (readonly number[])[],
  outcomes: readonly number[],
): PrccEntry[] {
  const k = params.length;
  const n = inputs.length;
  if (outcomes.length !== n)
    throw new RangeError(`PRCC needs one outcome per point: ${n} points, ${outcomes.length} outcomes`);
  const degreesOfFreedom = n - 2 - (k - 1);
  if (degreesOfFreedom < 1)
    throw new RangeError(`PRCC of ${k} parameters needs at least ${k + 2} points, got ${n}`);
  inputs.forEach((row, i) => {
    if (row.length !== k) throw new RangeError(`point ${i} has ${row.length} values for ${k} parameters`);
  });
  assertFiniteOutcomes(outcomes);
  const rankedInputs = params.map((_, j) => midranks(inputs.map((row) => row[j])));
  const rankedOutcome = midranks(outcomes);
  const ones = new Array<number>(n).fill(1);
  return params.map((p, j) => {
    const basis = orthonormalBasis([ones, ...rankedInputs.filter((_, other) => other !== j)]);
    const coefficient = pearson(residualsOn(basis, rankedInputs[j]), residualsOn(basis, rankedOutcome));
    const t = coefficient * Math.sqrt(degreesOfFreedom / (1 - coefficient * coefficient));
    // 2·F(−|t|) rather than 2·(1 − F(|t|)), which would round small p-values to 0.
    const pValue = Number.isNaN(t) ? NaN : Math.min(1, 2 * tCdf(-Math.abs(t), degreesOfFreedom));
    return { path: p.path, coefficient, t, degreesOfFreedom, pValue };
  });
}
