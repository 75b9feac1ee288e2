// Negative-binomial counts as a gamma–Poisson mixture: λ ~ Gamma(size, mean/size),
// X ~ Poisson(λ), giving mean `mean` and variance mean + mean²/size (e.g. Johnson,
// Kemp & Kotz 2005, Univariate Discrete Distributions, 3rd ed., §5.3). Used for
// overdispersed seed production; size → ∞ recovers the Poisson.
import type { UniformSource } from './stream';
import { gamma } from './gamma';
import { poisson } from './poisson';

function invalidNegativeBinomial(mean: number, size: number): never {
  if (!(mean >= 0 && mean < Infinity)) {
    throw new RangeError(`negative binomial mean must be a finite number >= 0, got ${mean}`);
  }
  throw new RangeError(`negative binomial size must be > 0 (Infinity for the Poisson limit), got ${size}`);
}

/** One negative-binomial count with the given mean and size (dispersion) parameter. */
export function negativeBinomial(src: UniformSource, mean: number, size: number): number {
  if (!(mean >= 0 && mean < Infinity && size > 0)) invalidNegativeBinomial(mean, size);
  if (mean === 0) return 0;
  if (size === Infinity) return poisson(src, mean);
  return poisson(src, gamma(src, size, mean / size));
}
