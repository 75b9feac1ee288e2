// Log-normal variates specified the way field data are summarised: the arithmetic
// mean and the coefficient of variation of the multiplier itself. With
// σ² = ln(1 + cv²) and μ = ln(mean) − σ²/2, exp(μ + σZ) has exactly that mean and
// cv (standard log-normal moments, e.g. Johnson, Kotz & Balakrishnan 1994,
// Continuous Univariate Distributions vol. 1, ch. 14).
import type { UniformSource } from './stream';
import { standardNormal } from './normal';

function invalidLognormal(mean: number, cv: number): never {
  if (!(mean > 0 && mean < Infinity))
    throw new RangeError(`log-normal mean must be a finite number > 0, got ${mean}`);
  throw new RangeError(`log-normal cv must be a finite number >= 0, got ${cv}`);
}

/** One log-normal variate with the given arithmetic mean and cv; cv = 0 returns the mean. */
export function lognormalMeanCv(src: UniformSource, mean: number, cv: number): number {
  if (!(mean > 0 && mean < Infinity && cv >= 0 && cv < Infinity)) invalidLognormal(mean, cv);
  if (cv === 0) return mean;
  const sigma2 = Math.log1p(cv * cv);
  return mean * Math.exp(Math.sqrt(sigma2) * standardNormal(src) - 0.5 * sigma2);
}
