import { describe, it, expect } from 'vitest';
import poissonPmf from '@stdlib/stats-base-dists-poisson-pmf';
import { streamFor } from '../../../models/random/stream';
import { Sampler } from '../../../models/random/sampler';
import { chiSquareDiscrete, drawMany, moments } from './stats';

// Goodness of fit: Pearson chi-square against @stdlib/stats-base-dists-poisson-pmf,
// p-value from @stdlib's chi-square CDF; fixed seeds, threshold p > 0.001.
describe('poisson goodness of fit (vs @stdlib poisson pmf)', () => {
  it.each([
    ['inversion', 3],
    ['inversion near its bound', 9.5],
    ['PTRS at its bound', 10],
    ['PTRS', 50],
    ['PTRS, huge mean', 1e7],
  ])('%s: mu=%s, p-value > 0.001', (_label, mu) => {
    const sampler = new Sampler(streamFor(707, 0));
    const xs = drawMany(400_000, () => sampler.poisson(mu));
    const sd = Math.sqrt(mu);
    const lo = Math.max(0, Math.floor(mu - 8 * sd - 10));
    const hi = Math.ceil(mu + 8 * sd + 20);
    const result = chiSquareDiscrete(xs, (k) => poissonPmf(k, mu), lo, hi);
    expect(result.bins).toBeGreaterThan(5);
    expect(result.pValue).toBeGreaterThan(0.001);
  });

  it('fails a deliberately wrong reference (the test has power): mu=50 draws vs mu=50.5', () => {
    const sampler = new Sampler(streamFor(708, 0));
    const xs = drawMany(60_000, () => sampler.poisson(50));
    expect(chiSquareDiscrete(xs, (k) => poissonPmf(k, 50.5), 0, 120).pValue).toBeLessThan(1e-6);
  });
});

describe('poisson moments (closed form: mean = variance = mu)', () => {
  it.each([0.2, 4, 12.5, 1000, 3e9])('mu=%s: mean and variance within 5 standard errors', (mu) => {
    const sampler = new Sampler(streamFor(709, Math.round(mu * 10)));
    const m = moments(drawMany(100_000, () => sampler.poisson(mu)));
    expect(Math.abs(m.mean - mu)).toBeLessThan(5 * Math.sqrt(mu / m.n));
    expect(Math.abs(m.variance - mu)).toBeLessThan(5 * m.varianceSe);
  });
});

describe('poisson edge cases', () => {
  const sampler = new Sampler(streamFor(710));

  it('returns 0 for mu = 0 (degenerate distribution)', () => {
    for (let i = 0; i < 10; i++) expect(sampler.poisson(0)).toBe(0);
  });

  it('returns non-negative integers for tiny and huge means', () => {
    for (const mu of [Number.MIN_VALUE, 1e-300, 1e-3, 1e12, 2 ** 52]) {
      const x = sampler.poisson(mu);
      expect(Number.isInteger(x) && x >= 0).toBe(true);
    }
  });

  it.each([-1, -Number.MIN_VALUE, Number.NaN, Infinity, 2 ** 53])('throws RangeError for mu = %s', (mu) => {
    expect(() => sampler.poisson(mu)).toThrow(RangeError);
  });
});
