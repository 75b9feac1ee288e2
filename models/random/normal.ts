// Standard normal variates by the ratio-of-uniforms method with Leva's quadratic
// bounds: Leva (1992), "A fast normal random number generator", ACM Trans. Math.
// Softw. 18(4): 449–453. Chosen because it keeps no state between calls (unlike the
// polar method's spare value), uses under three uniforms per variate and rarely
// needs a logarithm.
import type { UniformSource } from './stream';

export function standardNormal(src: UniformSource): number {
  for (;;) {
    // u in (0, 1], so log(u) below is finite and v / u is defined.
    const u = 1 - src.next();
    const v = 1.7156 * (src.next() - 0.5);
    const x = u - 0.449871;
    const y = Math.abs(v) + 0.386595;
    const q = x * x + y * (0.196 * y - 0.25472 * x);
    // Inner bound: accept without the exact test.
    if (q < 0.27597) return v / u;
    // Outer bound, then the exact boundary v² ≤ −4 u² log u.
    if (q <= 0.27846 && v * v <= -4 * u * u * Math.log(u)) return v / u;
  }
}
