import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import binomialPmf from '@stdlib/stats-base-dists-binomial-pmf';
import { streamFor } from '../../../models/random/stream';
import { Sampler } from '../../../models/random/sampler';
import { chiSquareDiscrete, drawMany, moments } from './stats';

// Goodness of fit: Pearson chi-square of the draws against the binomial pmf of
// @stdlib/stats-base-dists-binomial-pmf, p-value from @stdlib's chi-square CDF.
// Fixed seeds make each check deterministic; p > 0.001 would fail one correct
// sampler in a thousand seeds, and fails a wrong one (bias of ~1% of an sd or
// more at these sizes) with near certainty.
function fitBinomial(seed: number, n: number, p: number, draws: number, minExpected = 20) {
  const sampler = new Sampler(streamFor(seed, 0));
  const xs = drawMany(draws, () => sampler.binomial(n, p));
  const mean = n * p;
  const sd = Math.sqrt(n * p * (1 - p));
  // Eight standard deviations either side hold all but ~1e-15 of the mass.
  const lo = Math.max(0, Math.floor(mean - 8 * sd - 10));
  const hi = Math.min(n, Math.ceil(mean + 8 * sd + 10));
  return chiSquareDiscrete(xs, (k) => binomialPmf(k, n, p), lo, hi, minExpected);
}

describe('binomial goodness of fit (vs @stdlib binomial pmf)', () => {
  it.each([
    // [label, n, p] — inversion region (n·min(p, 1−p) < 30)
    ['small n, inversion', 20, 0.3],
    ['small n, p > 1/2 reflected', 20, 0.8],
    ['mean 29, just below the BTPE bound', 100, 0.29],
    ['n = 1e6 with tiny p, inversion', 1_000_000, 5e-6],
    // BTPE region
    ['mean 31, just above the BTPE bound', 100, 0.31],
    ['medium n, BTPE', 1000, 0.4],
    ['medium n, p > 1/2 reflected', 1000, 0.93],
    ['huge n, p = 0.5', 1e9, 0.5],
    ['huge n, p = 1e-6', 1e9, 1e-6],
  ])('%s: n=%s p=%s, p-value > 0.001', (_label, n, p) => {
    const result = fitBinomial(101, n, p, 400_000);
    expect(result.bins).toBeGreaterThan(5);
    expect(result.pValue).toBeGreaterThan(0.001);
  });

  it('huge n with p near 1: n − X fits Binomial(n, 1 − p) (symmetry of the binomial)', () => {
    const n = 1e9;
    const p = 1 - 1e-6;
    const q = 1 - p; // exact in binary floating point (Sterbenz lemma)
    const sampler = new Sampler(streamFor(202, 0));
    const complements = drawMany(60_000, () => n - sampler.binomial(n, p));
    const sd = Math.sqrt(n * q * p);
    const lo = Math.floor(n * q - 8 * sd);
    const hi = Math.ceil(n * q + 8 * sd);
    const result = chiSquareDiscrete(complements, (k) => binomialPmf(k, n, q), lo, hi);
    expect(result.pValue).toBeGreaterThan(0.001);
  });

  it('fails a deliberately wrong reference (the test has power): n=1000 draws vs p + 0.01', () => {
    const sampler = new Sampler(streamFor(303, 0));
    const xs = drawMany(60_000, () => sampler.binomial(1000, 0.4));
    const result = chiSquareDiscrete(xs, (k) => binomialPmf(k, 1000, 0.41), 300, 520);
    expect(result.pValue).toBeLessThan(1e-6);
  });
});

describe('binomial moments (closed forms: mean np, variance np(1−p))', () => {
  it.each([
    [50, 0.1],
    [5000, 0.37],
    [123_456_789, 0.61],
    [2 ** 40, 0.25],
  ])('n=%s p=%s: mean and variance within 5 standard errors', (n, p) => {
    const sampler = new Sampler(streamFor(404, n));
    const m = moments(drawMany(100_000, () => sampler.binomial(n, p)));
    const variance = n * p * (1 - p);
    expect(Math.abs(m.mean - n * p)).toBeLessThan(5 * Math.sqrt(variance / m.n));
    expect(Math.abs(m.variance - variance)).toBeLessThan(5 * m.varianceSe);
  });
});

describe('binomial edge cases', () => {
  const sampler = new Sampler(streamFor(505));

  it('returns 0 for n = 0 or p = 0 and n for p = 1 (degenerate distributions)', () => {
    for (const p of [0, 0.3, 1]) expect(sampler.binomial(0, p)).toBe(0);
    for (const n of [1, 17, 1e9, Number.MAX_SAFE_INTEGER]) {
      expect(sampler.binomial(n, 0)).toBe(0);
      expect(sampler.binomial(n, 1)).toBe(n);
    }
  });

  it('handles n up to 2^53 − 1 with draws inside [0, n] and near the mean', () => {
    const n = Number.MAX_SAFE_INTEGER;
    for (const p of [1e-12, 0.5, 1 - 1e-9]) {
      const x = sampler.binomial(n, p);
      expect(Number.isInteger(x) && x >= 0 && x <= n).toBe(true);
      // Chebyshev: |X − np| < 1000 sd with probability above 1 − 1e-6.
      expect(Math.abs(x - n * p)).toBeLessThan(1000 * Math.sqrt(n * p * (1 - p)) + 1);
    }
  });

  it.each([
    ['negative n', -1, 0.5],
    ['non-integer n', 2.5, 0.5],
    ['NaN n', Number.NaN, 0.5],
    ['infinite n', Infinity, 0.5],
    ['n beyond 2^53 − 1', 2 ** 53, 0.5],
    ['negative p', 10, -0.01],
    ['p above 1', 10, 1.01],
    ['NaN p', 10, Number.NaN],
  ])('throws RangeError for %s', (_label, n, p) => {
    expect(() => sampler.binomial(n, p)).toThrow(RangeError);
  });
});

describe('binomial property (fast-check)', () => {
  it('always returns an integer in [0, n] for valid (n, p)', () => {
    const sampler = new Sampler(streamFor(606));
    const count = fc.oneof(
      fc.integer({ min: 0, max: 200 }),
      fc.integer({ min: 0, max: 1_000_000 }),
      fc.maxSafeNat(),
    );
    const probability = fc.oneof(
      fc.double({ min: 0, max: 1, noNaN: true }),
      fc.constantFrom(0, 1, 0.5, Number.MIN_VALUE, 1 - Number.EPSILON / 2),
    );
    fc.assert(
      fc.property(count, probability, (n, p) => {
        const x = sampler.binomial(n, p);
        return Number.isInteger(x) && x >= 0 && x <= n;
      }),
      { seed: 7, numRuns: 5000 },
    );
  });
});
