// Beta variates, for fractions on [0, 1] such as uncertain efficacies or yearly
// germination multipliers.
//
// For a, b ≤ 1: Jöhnk (1964), "Erzeugung von betaverteilten und gammaverteilten
// Zufallszahlen", Metrika 8: 5–15 — the gamma route would divide two variates that
// both underflow to 0 for small shapes. Otherwise X/(X+Y) with X ~ Gamma(a),
// Y ~ Gamma(b) (e.g. Devroye 1986, Non-Uniform Random Variate Generation, ch. IX.4).
import type { UniformSource } from './stream';
import { gamma } from './gamma';

function invalidBeta(a: number, b: number): never {
  throw new RangeError(`beta shapes must be finite numbers > 0, got a = ${a}, b = ${b}`);
}

/** One Beta(a, b) variate. */
export function beta(src: UniformSource, a: number, b: number): number {
  if (!(a > 0 && a < Infinity && b > 0 && b < Infinity)) invalidBeta(a, b);
  if (a <= 1 && b <= 1) return johnk(src, a, b);
  const x = gamma(src, a, 1);
  return x / (x + gamma(src, b, 1));
}

function johnk(src: UniformSource, a: number, b: number): number {
  for (;;) {
    const u = 1 - src.next();
    const v = 1 - src.next();
    const x = Math.pow(u, 1 / a);
    const y = Math.pow(v, 1 / b);
    const sum = x + y;
    if (sum > 1) continue;
    if (sum > 0) return x / sum;
    // Both powers underflowed: finish the same ratio in log space.
    let logX = Math.log(u) / a;
    let logY = Math.log(v) / b;
    const logMax = logX > logY ? logX : logY;
    logX -= logMax;
    logY -= logMax;
    return Math.exp(logX - Math.log(Math.exp(logX) + Math.exp(logY)));
  }
}

function invalidBetaMeanSd(mean: number, sd: number): never {
  if (!(mean >= 0 && mean <= 1)) throw new RangeError(`beta mean must lie in [0, 1], got ${mean}`);
  throw new RangeError(
    `beta sd must be >= 0 and below sqrt(mean·(1 − mean)) = ${Math.sqrt(mean * (1 - mean))}, got ${sd}`,
  );
}

/**
 * Beta on [0, 1] with the given mean and standard deviation (moment matching:
 * a + b = mean(1 − mean)/sd² − 1). sd = 0 returns the mean itself.
 */
export function betaMeanSd(src: UniformSource, mean: number, sd: number): number {
  if (!(mean >= 0 && mean <= 1 && (sd === 0 || (sd > 0 && sd < Math.sqrt(mean * (1 - mean)))))) {
    invalidBetaMeanSd(mean, sd);
  }
  if (sd === 0) return mean;
  const total = (mean * (1 - mean)) / (sd * sd) - 1;
  return beta(src, mean * total, (1 - mean) * total);
}
