// Gamma variates by Marsaglia & Tsang (2000), "A simple method for generating gamma
// variables", ACM Trans. Math. Softw. 26(3): 363–372: a transformed-normal rejection
// for shape ≥ 1 (acceptance above 95%), and for shape < 1 their boost
// Gamma(shape) = Gamma(shape + 1) · U^(1/shape).
import type { UniformSource } from './stream';
import { standardNormal } from './normal';

function invalidGamma(shape: number, scale: number): never {
  if (!(shape > 0 && shape < Infinity))
    throw new RangeError(`gamma shape must be a finite number > 0, got ${shape}`);
  throw new RangeError(`gamma scale must be a finite number > 0, got ${scale}`);
}

/** One Gamma variate with the given shape and scale (mean shape·scale). */
export function gamma(src: UniformSource, shape: number, scale: number): number {
  if (!(shape > 0 && shape < Infinity && scale > 0 && scale < Infinity)) invalidGamma(shape, scale);
  if (shape < 1) {
    // 1 − U lies in (0, 1], so the power is never 0^(1/shape) by accident of U = 0.
    return standardGamma(src, shape + 1) * Math.pow(1 - src.next(), 1 / shape) * scale;
  }
  return standardGamma(src, shape) * scale;
}

/** Gamma(shape, 1) for shape ≥ 1. */
function standardGamma(src: UniformSource, shape: number): number {
  const d = shape - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  for (;;) {
    let x: number;
    let v: number;
    do {
      x = standardNormal(src);
      v = 1 + c * x;
    } while (v <= 0);
    v = v * v * v;
    const u = src.next();
    const x2 = x * x;
    // Squeeze, then the exact test (log(0) = −∞ accepts, which is right for u = 0).
    if (u < 1 - 0.0331 * x2 * x2) return d * v;
    if (Math.log(u) < 0.5 * x2 + d * (1 - v + Math.log(v))) return d * v;
  }
}
