// The one place where the life cycle meets randomness. The year's code is written once
// against `Chance`; a sampled chance draws integer counts (demographic noise), the mean
// field returns expectations. The two projections therefore share every step and order,
// and in the linear regime the stochastic mean equals the mean field by construction.
import type { Sampler } from '../random/sampler';
import type { EfficacyLaw } from './plan';

export interface Chance {
  /** How many of n individuals, each independently with probability p. */
  binomial(n: number, p: number): number;
  /** A Poisson count with the given mean. */
  poisson(mean: number): number;
  /** Seeds from plants: negative binomial with this size, Poisson when size is Infinity. */
  seedCount(mean: number, size: number): number;
  /** A year's environmental multiplier: mean 1, the given coefficient of variation. */
  environment(cv: number): number;
  /** One value of a step's efficacy. */
  efficacy(law: EfficacyLaw): number;
}

/** Demographic and environmental noise on whole counts, from one replicate's Sampler. */
export class SampledChance implements Chance {
  constructor(readonly sampler: Sampler) {}

  // Zero counts and certain outcomes need no variate; skipping them keeps runs fast on
  // sparse stages without changing any draw that matters.
  binomial(n: number, p: number): number {
    if (n === 0 || p === 0) return 0;
    if (p === 1) return n;
    return this.sampler.binomial(n, p);
  }

  poisson(mean: number): number {
    return mean > 0 ? this.sampler.poisson(mean) : 0;
  }

  seedCount(mean: number, size: number): number {
    if (!(mean > 0)) return 0;
    // The gamma–Poisson mixture needs a positive gamma scale mean/size; when that underflows
    // (mean below ~1e-308) the count is Poisson(mean) to any precision, i.e. almost surely 0.
    if (size === Infinity || mean / size === 0) return this.sampler.poisson(mean);
    return this.sampler.negativeBinomial(mean, size);
  }

  environment(cv: number): number {
    return this.sampler.lognormalMeanCv(1, cv);
  }

  efficacy(law: EfficacyLaw): number {
    if (law.triangular)
      return law.max === law.min ? law.min : this.sampler.triangular(law.min, law.mode, law.max);
    return this.sampler.betaMeanSd(law.mean, law.sd);
  }
}

/** Expected values: the deterministic mean-field projection. */
export const meanFieldChance: Chance = {
  binomial: (n, p) => n * p,
  poisson: (mean) => mean,
  seedCount: (mean) => mean,
  environment: () => 1,
  efficacy: (law) => law.expected,
};
