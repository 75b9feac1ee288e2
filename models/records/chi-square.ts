import gammaln from '@stdlib/math-base-special-gammaln';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';

/*
 * Chi-square tail and quantile from our own regularized incomplete gamma function.
 * Why not @stdlib's chi-square cdf/quantile: their incomplete gamma (@stdlib/math-base-special-
 * gammainc 0.3.1) switches to a large-x asymptotic series whenever x > 1000 and a < x, which is
 * off by up to ~3·10⁻⁴ in probability when a is close to x — exactly the upper Garwood limit of a
 * count of a thousand seeds or more, and the upper tail of a dispersion test over 2000+ samples.
 * The classic pair below (Numerical Recipes, Press et al. 2007, §6.2) is accurate there: the power
 * series for P(a, x) when x < a + 1, the Lentz continued fraction for Q(a, x) otherwise, each
 * computing the tail that is the smaller one so neither loses digits to 1 − (…).
 */

const EPS = 1e-16;
const TINY = 1e-300;
/** Both expansions converge in O(√a) terms; this cap is only reached on a genuine failure. */
const MAX_TERMS = 10_000_000;

function regularizedGamma(a: number, x: number): { lower: number; upper: number } {
  if (x <= 0) return { lower: 0, upper: 1 };
  if (x === Number.POSITIVE_INFINITY) return { lower: 1, upper: 0 };
  const prefix = Math.exp(a * Math.log(x) - x - gammaln(a));
  if (x < a + 1) {
    // P(a, x) = x^a e^(−x) / Γ(a) · Σ_{n ≥ 0} x^n / (a(a + 1)…(a + n))
    let term = 1 / a;
    let sum = term;
    for (let n = 1; n < MAX_TERMS; n++) {
      term *= x / (a + n);
      sum += term;
      if (term < sum * EPS) {
        const lower = prefix * sum;
        return { lower, upper: 1 - lower };
      }
    }
  } else {
    // Q(a, x) = x^a e^(−x) / Γ(a) · 1/(x + 1 − a − 1·(1 − a)/(x + 3 − a − 2·(2 − a)/(x + 5 − a − …)))
    let b = x + 1 - a;
    let c = 1 / TINY;
    let d = 1 / b;
    let h = d;
    for (let i = 1; i < MAX_TERMS; i++) {
      const an = -i * (i - a);
      b += 2;
      d = an * d + b;
      if (Math.abs(d) < TINY) d = TINY;
      c = b + an / c;
      if (Math.abs(c) < TINY) c = TINY;
      d = 1 / d;
      const step = d * c;
      h *= step;
      if (Math.abs(step - 1) < EPS) {
        const upper = prefix * h;
        return { lower: 1 - upper, upper };
      }
    }
  }
  throw new Error(`incomplete gamma did not converge for a = ${a}, x = ${x}`);
}

function requireDf(df: number): void {
  if (!(Number.isFinite(df) && df > 0))
    throw new RangeError(`chi-square degrees of freedom must be > 0, got ${df}`);
}

/** P(χ²_df > x): the p-value of a chi-square statistic. */
export function chiSquareUpperTail(x: number, df: number): number {
  requireDf(df);
  return regularizedGamma(df / 2, x / 2).upper;
}

/**
 * The x with P(χ²_df ≤ x) = p, by bisection on whichever tail is smaller (so 0.975 is solved as an
 * upper tail of 0.025, keeping relative precision), bracketed from the Wilson–Hilferty (1931)
 * approximation. Bisection is slow but cannot diverge, and quantiles are needed only a few at a time.
 */
export function chiSquareQuantile(p: number, df: number): number {
  requireDf(df);
  if (!(p > 0 && p < 1)) throw new RangeError(`chi-square quantile probability must be in (0, 1), got ${p}`);
  const a = df / 2;
  const upperTail = p > 0.5;
  const target = upperTail ? 1 - p : p;
  // True when x lies left of the quantile.
  const leftOf = (x: number): boolean => {
    const { lower, upper } = regularizedGamma(a, x / 2);
    return upperTail ? upper > target : lower < target;
  };
  const h = 2 / (9 * df);
  const guess = Math.max(df * (1 - h + normalQuantile(p, 0, 1) * Math.sqrt(h)) ** 3, Number.MIN_VALUE);
  let lo = guess;
  let hi = guess;
  while (!leftOf(lo) && lo > Number.MIN_VALUE) lo /= 2;
  while (leftOf(hi)) hi *= 2;
  for (let i = 0; i < 2000 && hi - lo > 2 * Number.EPSILON * hi; i++) {
    const mid = (lo + hi) / 2;
    if (leftOf(mid)) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
