import betaQuantile from '@stdlib/stats-base-dists-beta-quantile';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import { requireConfidence } from './checks';

/**
 * The two interval methods offered for a proportion:
 * - 'wilson': the score interval of Wilson (1927, JASA 22:209–212), without continuity correction —
 *   close to nominal coverage on average and never outside [0, 1]; Newcombe (1998, Stat. Med.
 *   17:857–872) recommends it, so it is the default.
 * - 'clopper-pearson': the exact interval of Clopper & Pearson (1934, Biometrika 26:404–413) from beta
 *   quantiles — never under-covers, at the price of being wider.
 */
export type BinomialMethod = 'wilson' | 'clopper-pearson';

export interface Proportion {
  successes: number;
  trials: number;
  estimate: number;
  lower: number;
  upper: number;
  confidence: number;
  method: BinomialMethod;
}

export function binomialInterval(
  successes: number,
  trials: number,
  method: BinomialMethod = 'wilson',
  confidence = 0.95,
): Proportion {
  if (!Number.isInteger(trials) || trials < 1) {
    throw new RangeError(`a proportion needs a whole number of trials ≥ 1, got ${trials}`);
  }
  if (!Number.isInteger(successes) || successes < 0 || successes > trials) {
    throw new RangeError(`successes must be a whole number from 0 to ${trials}, got ${successes}`);
  }
  requireConfidence(confidence);
  const tail = (1 - confidence) / 2;
  const limits =
    method === 'wilson' ? wilson(successes, trials, tail) : clopperPearson(successes, trials, tail);
  return { successes, trials, estimate: successes / trials, ...limits, confidence, method };
}

/**
 * (p + z²/2n ± z·√(p(1 − p)/n + z²/4n²)) / (1 + z²/n). At x = 0 and x = n the formula gives exactly 0
 * and 1; those ends are set directly because rounding could otherwise leave them a hair off.
 */
function wilson(x: number, n: number, tail: number): { lower: number; upper: number } {
  const z = normalQuantile(1 - tail, 0, 1);
  const z2 = z * z;
  const p = x / n;
  const scale = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / scale;
  const half = (z / scale) * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  return {
    lower: x === 0 ? 0 : centre - half,
    upper: x === n ? 1 : centre + half,
  };
}

/** lower = B(α/2; x, n − x + 1), upper = B(1 − α/2; x + 1, n − x), with 0 and 1 at the ends. */
function clopperPearson(x: number, n: number, tail: number): { lower: number; upper: number } {
  return {
    lower: x === 0 ? 0 : betaQuantile(tail, x, n - x + 1),
    upper: x === n ? 1 : betaQuantile(1 - tail, x + 1, n - x),
  };
}
