// log(k!) for the exact acceptance tests of the rejection samplers (Poisson PTRS,
// binomial BTPE). A table below TABLE_SIZE, where Stirling's series is least
// accurate; the series above it, where its truncation error is below 1e-17.

const HALF_LOG_TWO_PI = 0.9189385332046728;
const TABLE_SIZE = 128;

/**
 * Stirling-series remainder of log Γ(z): 1/(12z) − 1/(360z³) + 1/(1260z⁵) −
 * 1/(1680z⁷) + 1/(1188z⁹), over the common denominator 166320. The next term is
 * −691/(360360 z¹¹), so for z ≥ 16 the error is below 1e-16.
 */
export function stirlingRemainder(z: number): number {
  const z2 = z * z;
  return (13860 - (462 - (132 - (99 - 140 / z2) / z2) / z2) / z2) / z / 166320;
}

// Built by summing logs once at load: deterministic, and the summed rounding error
// (absolute, below 1e-11) is far below anything a sampler's acceptance test resolves.
const TABLE = new Float64Array(TABLE_SIZE);
for (let k = 2; k < TABLE_SIZE; k++) TABLE[k] = TABLE[k - 1] + Math.log(k);

/** log(k!) for a non-negative integer k. */
export function logFactorial(k: number): number {
  if (k < TABLE_SIZE) return TABLE[k];
  const z = k + 1;
  return (z - 0.5) * Math.log(z) - z + HALF_LOG_TWO_PI + stirlingRemainder(z);
}
