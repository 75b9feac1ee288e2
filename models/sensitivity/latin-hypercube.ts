// Latin hypercube sample on [0, 1)^k (McKay, Beckman & Conover 1979, Technometrics 21:239–245):
// each coordinate's range is cut into n equal strata and every stratum holds exactly one point,
// at a uniform position inside it; the strata are paired across coordinates by independent
// random permutations.
import type { Sampler } from '../random/sampler';

/** Uniform integer in [0, n) from one uniform variate. */
function below(sampler: Sampler, n: number): number {
  return Math.floor(sampler.uniform() * n);
}

/**
 * n rows of k unit coordinates. Draw order, fixed so a seed always gives the same design: for
 * each coordinate in turn, a Fisher–Yates permutation of the n strata (Knuth, TAOCP vol. 2,
 * Algorithm 3.4.2P), then the n positions inside the strata.
 */
export function latinHypercubeUnits(n: number, k: number, sampler: Sampler): number[][] {
  const rows = Array.from({ length: n }, () => new Array<number>(k));
  const stratum = new Array<number>(n);
  for (let j = 0; j < k; j++) {
    for (let i = 0; i < n; i++) stratum[i] = i;
    for (let i = n - 1; i > 0; i--) {
      const swap = below(sampler, i + 1);
      const held = stratum[i];
      stratum[i] = stratum[swap];
      stratum[swap] = held;
    }
    for (let i = 0; i < n; i++) {
      const s = stratum[i];
      const u = (s + sampler.uniform()) / n;
      // s + v rounds up to s + 1 for v within an ulp of 1; the stratum is half-open, so such a
      // point goes to the stratum's lower edge rather than onto the next stratum's.
      rows[i][j] = u < (s + 1) / n ? u : s / n;
    }
  }
  return rows;
}
