// Variance-based sensitivity indices from a Saltelli design (see designPoints, kind 'sobol'):
// - first order S_i = mean(f(B)·(f(A_B^i) − f(A))) / V, estimator (b) of Saltelli et al. 2010
//   (Comput. Phys. Commun. 181:259–270, Table 2): the share of the variance due to parameter i
//   alone;
// - total ST_i = ½·mean((f(A) − f(A_B^i))²) / V, Jansen's (1999, Comput. Phys. Commun.
//   117:35–43) estimator, also in Saltelli et al. 2010 Table 2: parameter i's share including
//   all its interactions;
// with V the variance of the outcome over the A and B rows together.
// Intervals are bootstrap percentile intervals (Efron & Tibshirani 1993, An Introduction to the
// Bootstrap, ch. 13): the N base rows are resampled with replacement, each resampled row
// bringing its f(A), f(B) and f(A_B^i), and every index is recomputed on each resample.
import { Sampler } from '../random/sampler';
import { streamFor } from '../random/stream';
import { quantileSorted } from '../summary/quantile';
import type { SweepParameter } from './design';
import { assertFiniteOutcomes } from './outcomes';
import { SOBOL_BOOTSTRAP_STREAM } from './streams';

export interface Estimate {
  value: number;
  /** Bootstrap percentile interval at the analysis' confidence level. */
  low: number;
  high: number;
}

export interface SobolIndex {
  path: string;
  first: Estimate;
  total: Estimate;
}

export interface SobolAnalysis {
  /** N: base rows analysed. */
  baseSamples: number;
  /** Outcome variance over the A and B rows; 0 means a constant outcome, whose indices are NaN. */
  variance: number;
  confidence: number;
  bootstrapDraws: number;
  /** In parameter order. */
  indices: SobolIndex[];
}

export interface SobolOptions {
  /** Bootstrap resamples, default 500. */
  bootstrapDraws?: number;
  /** Interval coverage in (0, 1), default 0.95. */
  confidence?: number;
}

/**
 * outcomes[i] is the outcome of point i of designPoints(params, { kind: 'sobol', … }, …), i.e. N
 * blocks [f(A_r), f(B_r), f(A_B^(1)_r), …, f(A_B^(k)_r)]. Any whole number (≥ 2) of leading blocks
 * may be given, so a running sweep can be analysed on its finished blocks. The bootstrap draws
 * from streamFor(seed, SOBOL_BOOTSTRAP_STREAM). An interval whose resamples include a constant
 * outcome (variance 0) is NaN.
 */
export function sobolIndices(
  params: readonly SweepParameter[],
  outcomes: readonly number[],
  seed: number,
  options: SobolOptions = {},
): SobolAnalysis {
  const { bootstrapDraws = 500, confidence = 0.95 } = options;
  const k = params.length;
  const width = k + 2;
  const n = outcomes.length / width;
  if (k === 0) throw new RangeError('Sobol indices need at least one parameter');
  if (!Number.isInteger(n) || n < 2) {
    throw new RangeError(
      `Sobol indices need whole blocks of ${width} outcomes, at least 2; got ${outcomes.length} outcomes`,
    );
  }
  if (!Number.isInteger(bootstrapDraws) || bootstrapDraws < 1) {
    throw new RangeError(`bootstrap draws must be a positive integer, got ${bootstrapDraws}`);
  }
  if (!(confidence > 0 && confidence < 1))
    throw new RangeError(`confidence must be in (0, 1), got ${confidence}`);
  assertFiniteOutcomes(outcomes);

  const rows = Array.from({ length: n }, (_, r) => r);
  const point = indicesOn(outcomes, k, rows);

  const sampler = new Sampler(streamFor(seed, SOBOL_BOOTSTRAP_STREAM));
  const firstDraws = params.map(() => new Float64Array(bootstrapDraws));
  const totalDraws = params.map(() => new Float64Array(bootstrapDraws));
  for (let b = 0; b < bootstrapDraws; b++) {
    for (let r = 0; r < n; r++) rows[r] = Math.floor(sampler.uniform() * n);
    const draw = indicesOn(outcomes, k, rows);
    for (let i = 0; i < k; i++) {
      firstDraws[i][b] = draw.first[i];
      totalDraws[i][b] = draw.total[i];
    }
  }
  const tail = (1 - confidence) / 2;
  const estimate = (value: number, draws: Float64Array): Estimate => {
    if (draws.some(Number.isNaN)) return { value, low: NaN, high: NaN };
    draws.sort();
    return { value, low: quantileSorted(draws, tail), high: quantileSorted(draws, 1 - tail) };
  };
  return {
    baseSamples: n,
    variance: point.variance,
    confidence,
    bootstrapDraws,
    indices: params.map((p, i) => ({
      path: p.path,
      first: estimate(point.first[i], firstDraws[i]),
      total: estimate(point.total[i], totalDraws[i]),
    })),
  };
}

/** S_i and ST_i over the base rows listed in `rows` (repeats allowed: a bootstrap resample). */
function indicesOn(
  outcomes: readonly number[],
  k: number,
  rows: readonly number[],
): { variance: number; first: number[]; total: number[] } {
  const width = k + 2;
  const n = rows.length;
  let mean = 0;
  for (const r of rows) mean += outcomes[r * width] + outcomes[r * width + 1];
  mean /= 2 * n;
  let variance = 0;
  for (const r of rows) {
    variance += (outcomes[r * width] - mean) ** 2 + (outcomes[r * width + 1] - mean) ** 2;
  }
  variance /= 2 * n;
  const first = new Array<number>(k).fill(0);
  const total = new Array<number>(k).fill(0);
  for (const r of rows) {
    const fA = outcomes[r * width];
    const fB = outcomes[r * width + 1];
    for (let i = 0; i < k; i++) {
      const fAB = outcomes[r * width + 2 + i];
      first[i] += fB * (fAB - fA);
      total[i] += (fA - fAB) ** 2;
    }
  }
  for (let i = 0; i < k; i++) {
    first[i] /= n * variance;
    total[i] /= 2 * n * variance;
  }
  return { variance, first, total };
}
