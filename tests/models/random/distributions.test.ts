import { describe, it, expect } from 'vitest';
import { erf, lgamma } from 'mathjs';
import chisquareCdf from '@stdlib/stats-base-dists-chisquare-cdf';
import { streamFor } from '../../../models/random/stream';
import { Sampler } from '../../../models/random/sampler';
import { chiSquareContinuous, chiSquareDiscrete, drawMany, moments } from './stats';

const N = 100_000;

/** Mean and variance within 5 standard errors of closed-form values. */
function expectMoments(xs: Float64Array, mean: number, variance: number): void {
  const m = moments(xs);
  expect(Math.abs(m.mean - mean)).toBeLessThan(5 * Math.sqrt(variance / m.n));
  expect(Math.abs(m.variance - variance)).toBeLessThan(5 * m.varianceSe);
}

/** Standard normal CDF, Φ(x) = (1 + erf(x/√2))/2, with erf from mathjs. */
const phi = (x: number) => 0.5 * (1 + erf(x / Math.SQRT2));

/** Cut points at the 2.5%, 5%, ..., 97.5% quantiles of a sample, for chi-square bins. */
function sampleCuts(xs: Float64Array): number[] {
  const sorted = Float64Array.from(xs).sort();
  return Array.from({ length: 39 }, (_, i) => sorted[Math.floor(((i + 1) * sorted.length) / 40)]);
}

describe('normal', () => {
  it('has mean 0 and variance 1 and fits Φ (mathjs erf) by chi-square, p > 0.001', () => {
    const s = new Sampler(streamFor(1001));
    const xs = drawMany(N, () => s.normal());
    expectMoments(xs, 0, 1);
    const cuts = Array.from({ length: 31 }, (_, i) => -3 + i * 0.2);
    expect(chiSquareContinuous(xs, phi, cuts).pValue).toBeGreaterThan(0.001);
  });
});

describe('uniform', () => {
  it('has mean 1/2 and variance 1/12 (closed form)', () => {
    const s = new Sampler(streamFor(1002));
    expectMoments(
      drawMany(N, () => s.uniform()),
      0.5,
      1 / 12,
    );
  });
});

describe('gamma', () => {
  // 2X/θ ~ χ²(2k) for X ~ Gamma(k, θ) (e.g. Johnson, Kotz & Balakrishnan 1994,
  // Continuous Univariate Distributions vol. 1, ch. 17), so @stdlib's chi-square
  // CDF gives the gamma CDF.
  it.each([
    [0.3, 2],
    [1, 1],
    [2.5, 0.4],
    [150, 3],
  ])('shape=%s scale=%s: mean kθ, variance kθ², and the CDF by chi-square', (shape, scale) => {
    const s = new Sampler(streamFor(1003, Math.round(shape * 10)));
    const xs = drawMany(N, () => s.gamma(shape, scale));
    expectMoments(xs, shape * scale, shape * scale * scale);
    const cdf = (x: number) => chisquareCdf((2 * x) / scale, 2 * shape);
    expect(chiSquareContinuous(xs, cdf, sampleCuts(xs)).pValue).toBeGreaterThan(0.001);
  });

  it.each([
    [0, 1],
    [-1, 1],
    [1, 0],
    [Number.NaN, 1],
    [1, Infinity],
  ])('throws RangeError for shape=%s scale=%s', (shape, scale) => {
    expect(() => new Sampler(streamFor(1)).gamma(shape, scale)).toThrow(RangeError);
  });
});

describe('negative binomial', () => {
  // Gamma–Poisson mixture: P(k) = Γ(k+r)/(k! Γ(r)) (r/(r+m))^r (m/(r+m))^k, mean m,
  // variance m + m²/r (e.g. Johnson, Kemp & Kotz 2005, §5.3); Γ from mathjs lgamma.
  const pmf = (mean: number, size: number) => (k: number) =>
    Math.exp(
      lgamma(k + size) -
        lgamma(k + 1) -
        lgamma(size) +
        size * Math.log(size / (size + mean)) +
        k * Math.log(mean / (size + mean)),
    );

  it.each([
    [20, 2],
    [3, 50],
    [1000, 0.5],
    [40, 1e6],
  ])('mean=%s size=%s: mean m and variance m + m²/size', (mean, size) => {
    const s = new Sampler(streamFor(1004, mean));
    expectMoments(
      drawMany(N, () => s.negativeBinomial(mean, size)),
      mean,
      mean + (mean * mean) / size,
    );
  });

  it('fits the negative-binomial pmf (mean 20, size 2) by chi-square, p > 0.001', () => {
    const s = new Sampler(streamFor(1005));
    const xs = drawMany(60_000, () => s.negativeBinomial(20, 2));
    expect(chiSquareDiscrete(xs, pmf(20, 2), 0, 400).pValue).toBeGreaterThan(0.001);
  });

  it('with size = Infinity is the Poisson limit (variance = mean)', () => {
    const s = new Sampler(streamFor(1006));
    expectMoments(
      drawMany(N, () => s.negativeBinomial(7, Infinity)),
      7,
      7,
    );
  });

  it('returns 0 for mean 0 and throws RangeError for bad arguments', () => {
    const s = new Sampler(streamFor(1007));
    expect(s.negativeBinomial(0, 3)).toBe(0);
    expect(() => s.negativeBinomial(-1, 3)).toThrow(RangeError);
    expect(() => s.negativeBinomial(5, 0)).toThrow(RangeError);
    expect(() => s.negativeBinomial(5, Number.NaN)).toThrow(RangeError);
    expect(() => s.negativeBinomial(Infinity, 2)).toThrow(RangeError);
  });
});

describe('beta', () => {
  // Mean a/(a+b), variance ab/((a+b)²(a+b+1)); Beta(a, 1) has CDF x^a and
  // Beta(1, b) has CDF 1 − (1−x)^b (closed forms).
  it.each([
    [0.5, 0.5],
    [0.2, 0.9],
    [2, 5],
    [0.4, 3],
    [80, 20],
  ])('a=%s b=%s: mean and variance', (a, b) => {
    const s = new Sampler(streamFor(1008, Math.round(a * 100 + b)));
    expectMoments(
      drawMany(N, () => s.beta(a, b)),
      a / (a + b),
      (a * b) / ((a + b) ** 2 * (a + b + 1)),
    );
  });

  it.each([
    ['Jöhnk branch', 0.5, 1, (x: number) => Math.sqrt(x)],
    ['gamma branch', 3, 1, (x: number) => x ** 3],
    ['gamma branch, b > 1', 1, 2.5, (x: number) => 1 - (1 - x) ** 2.5],
  ])('%s: Beta(%s, %s) fits its closed-form CDF, p > 0.001', (_label, a, b, cdf) => {
    const s = new Sampler(streamFor(1009, Math.round(a * 100 + b)));
    const xs = drawMany(N, () => s.beta(a, b));
    const cuts = Array.from({ length: 19 }, (_, i) => (i + 1) / 20);
    expect(chiSquareContinuous(xs, cdf, cuts).pValue).toBeGreaterThan(0.001);
  });

  it('stays inside [0, 1] for very small shapes, where both powers underflow', () => {
    const s = new Sampler(streamFor(1010));
    const xs = drawMany(10_000, () => s.beta(0.001, 0.002));
    expect(xs.every((x) => x >= 0 && x <= 1)).toBe(true);
    // Beta(a, b) with tiny shapes puts mass a/(a+b) = 1/3 near 1 (mean), rest near 0.
    expectMoments(xs, 1 / 3, (0.001 * 0.002) / (0.003 ** 2 * 1.003));
  });

  it('throws RangeError for non-positive shapes', () => {
    const s = new Sampler(streamFor(1011));
    expect(() => s.beta(0, 1)).toThrow(RangeError);
    expect(() => s.beta(1, -2)).toThrow(RangeError);
    expect(() => s.beta(Number.NaN, 1)).toThrow(RangeError);
  });
});

describe('betaMeanSd', () => {
  it.each([
    [0.7, 0.1],
    [0.05, 0.02],
    [0.5, 0.45],
  ])('mean=%s sd=%s: sample mean and variance match', (mean, sd) => {
    const s = new Sampler(streamFor(1012, Math.round(mean * 100)));
    const xs = drawMany(N, () => s.betaMeanSd(mean, sd));
    expect(xs.every((x) => x >= 0 && x <= 1)).toBe(true);
    expectMoments(xs, mean, sd * sd);
  });

  it('returns the mean for sd = 0 and throws RangeError for sd ≥ sqrt(mean(1 − mean)) or a mean outside [0, 1]', () => {
    const s = new Sampler(streamFor(1013));
    expect(s.betaMeanSd(0.3, 0)).toBe(0.3);
    expect(s.betaMeanSd(0, 0)).toBe(0);
    expect(s.betaMeanSd(1, 0)).toBe(1);
    expect(() => s.betaMeanSd(0.5, 0.5)).toThrow(RangeError);
    expect(() => s.betaMeanSd(0, 0.1)).toThrow(RangeError);
    expect(() => s.betaMeanSd(1.2, 0.1)).toThrow(RangeError);
    expect(() => s.betaMeanSd(0.5, -0.1)).toThrow(RangeError);
    expect(() => s.betaMeanSd(0.5, Number.NaN)).toThrow(RangeError);
  });
});

describe('lognormalMeanCv', () => {
  // exp(μ + σZ) with σ² = ln(1 + cv²), μ = ln m − σ²/2 has mean m and sd m·cv
  // (Johnson, Kotz & Balakrishnan 1994, ch. 14).
  it.each([
    [1, 0.3],
    [250, 0.05],
    [0.02, 1.2],
  ])('mean=%s cv=%s: sample mean and cv match', (mean, cv) => {
    const s = new Sampler(streamFor(1014, Math.round(cv * 100)));
    const xs = drawMany(N, () => s.lognormalMeanCv(mean, cv));
    expect(xs.every((x) => x > 0)).toBe(true);
    expectMoments(xs, mean, (mean * cv) ** 2);
  });

  it('fits the log-normal CDF Φ((ln x − μ)/σ) by chi-square, p > 0.001', () => {
    const s = new Sampler(streamFor(1015));
    const xs = drawMany(N, () => s.lognormalMeanCv(2, 0.5));
    const sigma = Math.sqrt(Math.log(1 + 0.25));
    const mu = Math.log(2) - (sigma * sigma) / 2;
    const cdf = (x: number) => phi((Math.log(x) - mu) / sigma);
    expect(chiSquareContinuous(xs, cdf, sampleCuts(xs)).pValue).toBeGreaterThan(0.001);
  });

  it('returns the mean for cv = 0 and throws RangeError for mean ≤ 0 or cv < 0', () => {
    const s = new Sampler(streamFor(1016));
    expect(s.lognormalMeanCv(3.5, 0)).toBe(3.5);
    expect(() => s.lognormalMeanCv(0, 0.2)).toThrow(RangeError);
    expect(() => s.lognormalMeanCv(1, -0.2)).toThrow(RangeError);
    expect(() => s.lognormalMeanCv(Number.NaN, 0.2)).toThrow(RangeError);
  });
});

describe('triangular', () => {
  // Mean (a+b+c)/3, variance (a²+b²+c²−ab−ac−bc)/18; CDF (x−a)²/((b−a)(c−a)) below
  // the mode c, 1 − (b−x)²/((b−a)(b−c)) above it (closed forms).
  it.each([
    [1, 2, 5],
    [0, 0, 1],
    [-3, 4, 4],
  ])('min=%s mode=%s max=%s: moments and CDF', (a, c, b) => {
    const s = new Sampler(streamFor(1017, a + 10));
    const xs = drawMany(N, () => s.triangular(a, c, b));
    expect(xs.every((x) => x >= a && x <= b)).toBe(true);
    expectMoments(xs, (a + b + c) / 3, (a * a + b * b + c * c - a * b - a * c - b * c) / 18);
    const cdf = (x: number) =>
      x <= c ? (x - a) ** 2 / ((b - a) * (c - a)) : 1 - (b - x) ** 2 / ((b - a) * (b - c));
    const cuts = Array.from({ length: 19 }, (_, i) => a + ((b - a) * (i + 1)) / 20);
    expect(chiSquareContinuous(xs, cdf, cuts).pValue).toBeGreaterThan(0.001);
  });

  it('returns min when min = max and throws RangeError when the order is wrong', () => {
    const s = new Sampler(streamFor(1018));
    expect(s.triangular(2, 2, 2)).toBe(2);
    expect(() => s.triangular(3, 1, 5)).toThrow(RangeError);
    expect(() => s.triangular(0, 6, 5)).toThrow(RangeError);
    expect(() => s.triangular(Number.NaN, 1, 2)).toThrow(RangeError);
    expect(() => s.triangular(0, 1, Infinity)).toThrow(RangeError);
  });
});

describe('Sampler.draws', () => {
  it('counts one per variate produced, whatever the uniforms consumed', () => {
    const s = new Sampler(streamFor(1019));
    expect(s.draws).toBe(0);
    s.uniform();
    s.normal();
    s.binomial(1e9, 0.3);
    s.poisson(1e6);
    s.gamma(0.5, 1);
    s.negativeBinomial(10, 2);
    s.beta(2, 3);
    s.lognormalMeanCv(1, 0.2);
    s.betaMeanSd(0.5, 0.1);
    s.triangular(0, 1, 2);
    expect(s.draws).toBe(10);
  });

  it('shares its source: two samplers over equal streams give equal draws', () => {
    const a = new Sampler(streamFor(1020, 4));
    const b = new Sampler(streamFor(1020, 4));
    for (let i = 0; i < 100; i++) expect(a.binomial(1000 + i, 0.3)).toBe(b.binomial(1000 + i, 0.3));
  });
});
