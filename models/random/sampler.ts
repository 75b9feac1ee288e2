// The distributions of the engine over one uniform stream (numpy's Generator to
// stream.ts's BitGenerator). Each method delegates to the file of its distribution;
// this class only binds the stream and counts variates for the benchmarks.
import type { UniformSource } from './stream';
import { binomial } from './binomial';
import { poisson } from './poisson';
import { gamma } from './gamma';
import { standardNormal } from './normal';
import { negativeBinomial } from './negativebinomial';
import { beta, betaMeanSd } from './beta';
import { lognormalMeanCv } from './lognormal';
import { triangular } from './triangular';

export class Sampler {
  /** Number of variates produced so far (not uniforms consumed). */
  draws = 0;

  constructor(readonly source: UniformSource) {}

  /** Uniform on [0, 1). */
  uniform(): number {
    this.draws++;
    return this.source.next();
  }

  /** Standard normal. */
  normal(): number {
    this.draws++;
    return standardNormal(this.source);
  }

  /** Binomial(n, p): n a non-negative integer, 0 ≤ p ≤ 1. Exact for any n up to 2^53 − 1. */
  binomial(n: number, p: number): number {
    this.draws++;
    return binomial(this.source, n, p);
  }

  /** Poisson(mu), mu ≥ 0. Exact. */
  poisson(mu: number): number {
    this.draws++;
    return poisson(this.source, mu);
  }

  /** Gamma with shape > 0 and scale > 0 (mean shape·scale). */
  gamma(shape: number, scale: number): number {
    this.draws++;
    return gamma(this.source, shape, scale);
  }

  /** Negative binomial with the given mean and size: variance mean + mean²/size. */
  negativeBinomial(mean: number, size: number): number {
    this.draws++;
    return negativeBinomial(this.source, mean, size);
  }

  /** Beta(a, b), a > 0, b > 0. */
  beta(a: number, b: number): number {
    this.draws++;
    return beta(this.source, a, b);
  }

  /** Log-normal with the given arithmetic mean (> 0) and coefficient of variation; cv = 0 returns mean. */
  lognormalMeanCv(mean: number, cv: number): number {
    this.draws++;
    return lognormalMeanCv(this.source, mean, cv);
  }

  /** Beta on [0, 1] with the given mean and sd; sd = 0 returns mean; needs sd < sqrt(mean(1 − mean)). */
  betaMeanSd(mean: number, sd: number): number {
    this.draws++;
    return betaMeanSd(this.source, mean, sd);
  }

  /** Triangular on [min, max] with its peak at mode. */
  triangular(min: number, mode: number, max: number): number {
    this.draws++;
    return triangular(this.source, min, mode, max);
  }
}
