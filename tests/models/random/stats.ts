// Statistical checks shared by the random-number tests: Pearson's chi-square
// goodness of fit, with its p-value from @stdlib's chi-square CDF, and sample
// moments with their large-sample standard errors.
import chisquareCdf from '@stdlib/stats-base-dists-chisquare-cdf';

export interface ChiSquareResult {
  statistic: number;
  df: number;
  pValue: number;
  bins: number;
}

/**
 * Pearson's chi-square test of integer draws against a pmf over [lo, hi]. Adjacent
 * values are pooled until each bin expects at least `minExpected` draws (the usual
 * rule that the chi-square approximation needs expected counts of 5 or more).
 * Draws below lo or above hi are counted in the first or last bin; the caller picks
 * lo and hi so wide that the pmf mass outside them is negligible.
 */
export function chiSquareDiscrete(
  draws: ArrayLike<number>,
  pmf: (k: number) => number,
  lo: number,
  hi: number,
  minExpected = 20,
): ChiSquareResult {
  const total = draws.length;
  const counts = new Map<number, number>();
  for (let i = 0; i < total; i++) {
    const k = Math.min(hi, Math.max(lo, draws[i]));
    counts.set(k, (counts.get(k) ?? 0) + 1);
  }
  const expected: number[] = [];
  const observed: number[] = [];
  let mass = 0;
  let seen = 0;
  for (let k = lo; k <= hi; k++) {
    mass += pmf(k);
    seen += counts.get(k) ?? 0;
    if (mass * total >= minExpected) {
      expected.push(mass * total);
      observed.push(seen);
      mass = 0;
      seen = 0;
    }
  }
  // Fold the remainder into the last bin.
  expected[expected.length - 1] += mass * total;
  observed[observed.length - 1] += seen;
  let statistic = 0;
  for (let b = 0; b < expected.length; b++) statistic += (observed[b] - expected[b]) ** 2 / expected[b];
  const df = expected.length - 1;
  return { statistic, df, pValue: 1 - chisquareCdf(statistic, df), bins: expected.length };
}

/** Chi-square test of continuous draws against a CDF over the given cut points. */
export function chiSquareContinuous(
  draws: ArrayLike<number>,
  cdf: (x: number) => number,
  cuts: number[],
): ChiSquareResult {
  const total = draws.length;
  const observed = new Array<number>(cuts.length + 1).fill(0);
  for (let i = 0; i < total; i++) {
    let b = 0;
    while (b < cuts.length && draws[i] >= cuts[b]) b++;
    observed[b]++;
  }
  let statistic = 0;
  let previous = 0;
  for (let b = 0; b <= cuts.length; b++) {
    const upper = b < cuts.length ? cdf(cuts[b]) : 1;
    const expected = (upper - previous) * total;
    statistic += (observed[b] - expected) ** 2 / expected;
    previous = upper;
  }
  const df = cuts.length;
  return { statistic, df, pValue: 1 - chisquareCdf(statistic, df), bins: cuts.length + 1 };
}

export interface Moments {
  n: number;
  mean: number;
  variance: number;
  /** Standard error of the sample variance, sqrt((m4 − s⁴)/n) (large-sample result). */
  varianceSe: number;
}

export function moments(xs: ArrayLike<number>): Moments {
  const n = xs.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += xs[i];
  const mean = sum / n;
  let m2 = 0;
  let m4 = 0;
  for (let i = 0; i < n; i++) {
    const d2 = (xs[i] - mean) ** 2;
    m2 += d2;
    m4 += d2 * d2;
  }
  const variance = m2 / (n - 1);
  m4 /= n;
  return { n, mean, variance, varianceSe: Math.sqrt(Math.max(0, m4 - (m2 / n) ** 2) / n) };
}

/** n draws of f into a Float64Array. */
export function drawMany(n: number, f: () => number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = f();
  return out;
}

/** Pearson correlation of two equally long samples. */
export function correlation(xs: ArrayLike<number>, ys: ArrayLike<number>): number {
  const n = xs.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += xs[i];
    my += ys[i];
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = xs[i] - mx;
    const dy = ys[i] - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  return sxy / Math.sqrt(sxx * syy);
}
