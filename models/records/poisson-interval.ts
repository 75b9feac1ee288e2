import { chiSquareQuantile } from './chi-square';
import { requireConfidence } from './checks';

/**
 * Exact (central, equal-tailed) confidence limits for the mean of a Poisson count x, by Garwood's
 * (1936, Biometrika 28:437–442) relation with the chi-square distribution:
 *     lower = χ²(α/2; 2x) / 2,   upper = χ²(1 − α/2; 2x + 2) / 2,   lower = 0 when x = 0.
 * "Exact" means each tail holds at most α/2 whatever the mean, so the interval never under-covers,
 * which is what a sparse seedbank sample (often a handful of seeds) needs.
 */
export function exactPoissonInterval(count: number, confidence = 0.95): { lower: number; upper: number } {
  if (!Number.isInteger(count) || count < 0) {
    throw new RangeError(`a Poisson count must be a whole number ≥ 0, got ${count}`);
  }
  requireConfidence(confidence);
  const tail = (1 - confidence) / 2;
  const lower = count === 0 ? 0 : chiSquareQuantile(tail, 2 * count) / 2;
  const upper = chiSquareQuantile(1 - tail, 2 * count + 2) / 2;
  return { lower, upper };
}
