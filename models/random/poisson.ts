// Exact Poisson variates, e.g. seeds set per flowering plant or immigrant seed rain.
//
// mu < 10: inversion by sequential search from 0 (one uniform, about mu + 1 steps).
// mu ≥ 10: PTRS, the transformed rejection with squeeze of Hörmann (1993), "The
// transformed rejection method for generating Poisson random variables", Insurance:
// Mathematics and Economics 12: 39–45, whose expected cost does not grow with mu.
import type { UniformSource } from './stream';
import { logFactorial } from './logfactorial';

const PTRS_MIN_MEAN = 10;
// Above 2^52 consecutive integers are no longer all representable near mu.
const MAX_MEAN = 2 ** 52;
// Inversion stops and restarts past this count. With mu < 10 the mass beyond it is
// below 1e-40 (Chernoff bound), so the cut only guards against round-off in the
// running subtraction.
const INVERSION_CUT = 80;

function invalidPoisson(mu: number): never {
  throw new RangeError(`poisson mean must be a finite number in [0, 2^52], got ${mu}`);
}

/** One Poisson(mu) variate. */
export function poisson(src: UniformSource, mu: number): number {
  if (!(mu >= 0 && mu <= MAX_MEAN)) invalidPoisson(mu);
  if (mu === 0) return 0;
  return mu < PTRS_MIN_MEAN ? inversion(src, mu) : ptrs(src, mu);
}

function inversion(src: UniformSource, mu: number): number {
  const p0 = Math.exp(-mu);
  let x = 0;
  let px = p0;
  let u = src.next();
  while (u > px) {
    x++;
    if (x > INVERSION_CUT) {
      x = 0;
      px = p0;
      u = src.next();
    } else {
      u -= px;
      px *= mu / x;
    }
  }
  return x;
}

/** PTRS with the paper's constants; step numbers follow the paper. */
function ptrs(src: UniformSource, mu: number): number {
  const logMu = Math.log(mu);
  const b = 0.931 + 2.53 * Math.sqrt(mu);
  const a = -0.059 + 0.02483 * b;
  const logInvAlpha = Math.log(1.1239 + 1.1328 / (b - 3.4));
  const vr = 0.9277 - 3.6224 / (b - 2);
  for (;;) {
    // Step 1: a candidate from the transformed hat.
    const u = src.next() - 0.5;
    const v = src.next();
    const us = 0.5 - Math.abs(u);
    const k = Math.floor(((2 * a) / us + b) * u + mu + 0.43);
    // Step 2: squeeze — inside this box the hat lies under the density.
    if (us >= 0.07 && v <= vr) return k;
    // Step 3: outside the support, or in the thin strip where the hat is loose.
    if (k < 0 || (us < 0.013 && v > us)) continue;
    // Step 4: the exact test.
    if (Math.log(v) + logInvAlpha - Math.log(a / (us * us) + b) <= -mu + k * logMu - logFactorial(k)) {
      return k;
    }
  }
}
