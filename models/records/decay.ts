import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { requireConfidence } from './checks';
import type { Estimate } from './estimate';
import { RecordsError, type RecordIssue } from './records-error';

/** A seedbank density measured in one year (e.g. a layer's estimate from that year's cores). */
export interface SeedbankObservation {
  year: number;
  seedsPerM2: number;
}

export interface DecayEstimate {
  observations: number;
  /** Residual degrees of freedom, n − 2. */
  df: number;
  firstYear: number;
  /** b in ln S = a + b·(year − first year): the yearly change in ln density. */
  slope: number;
  slopeStandardError: number;
  /** a: fitted ln density in the first year. */
  intercept: number;
  /** Share of the variance of ln density explained by the trend; null when every density is equal. */
  rSquared: number | null;
  /** e^b with limits e^(b ± t·SE): the fraction of the seedbank left after a year. */
  annualSurvival: Estimate;
  /** 1 − e^b with limits 1 − e^(b ∓ t·SE): the fraction lost per year. Negative if the seedbank grew. */
  decayRate: Estimate;
  /** ln 2 / (−b) in years when the seedbank shrank, else null. */
  halfLifeYears: number | null;
}

/**
 * Annual seed decay from a seedbank time series by ordinary least squares on the log scale,
 *     ln Sₜ = a + b·t,   decay = 1 − e^b,
 * which is the constant-rate (exponential) loss model of seed persistence. The interval is the
 * slope's t interval, b ± t(1 − α/2; n − 2)·SE(b), mapped through 1 − e^b (monotone, so the limits
 * swap ends). Several observations in one year (replicate samples) are allowed. A series that also
 * receives seed rain measures net change, not decay alone.
 */
export function estimateSeedDecay(
  series: readonly SeedbankObservation[],
  options: { confidence?: number } = {},
): DecayEstimate {
  const confidence = options.confidence ?? 0.95;
  requireConfidence(confidence);
  const issues: RecordIssue[] = [];
  series.forEach((o, index) => {
    if (!(typeof o.year === 'number' && Number.isFinite(o.year))) {
      issues.push({ index, message: `year must be a number, got ${String(o.year)}` });
    }
    if (!(typeof o.seedsPerM2 === 'number' && Number.isFinite(o.seedsPerM2) && o.seedsPerM2 > 0)) {
      issues.push({
        index,
        message: `seedbank density must be greater than 0 seeds/m² to take its logarithm, got ${String(o.seedsPerM2)} (a year with no seeds found cannot enter a log-linear fit)`,
      });
    }
  });
  if (issues.length === 0) {
    if (series.length < 3) {
      issues.push({
        index: null,
        message: `a decay rate with an interval needs at least 3 observations, got ${series.length}`,
      });
    } else if (new Set(series.map((o) => o.year)).size < 2) {
      issues.push({
        index: null,
        message: 'all observations are from one year: a rate of change needs at least 2 years',
      });
    }
  }
  if (issues.length > 0) throw new RecordsError('seedbank time series', issues);

  const n = series.length;
  const firstYear = Math.min(...series.map((o) => o.year));
  const x = series.map((o) => o.year - firstYear);
  const y = series.map((o) => Math.log(o.seedsPerM2));
  const meanX = x.reduce((s, v) => s + v, 0) / n;
  const meanY = y.reduce((s, v) => s + v, 0) / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (x[i] - meanX) ** 2;
    sxy += (x[i] - meanX) * (y[i] - meanY);
    syy += (y[i] - meanY) ** 2;
  }
  const slope = sxy / sxx;
  const intercept = meanY - slope * meanX;
  let sse = 0;
  for (let i = 0; i < n; i++) sse += (y[i] - intercept - slope * x[i]) ** 2;
  const df = n - 2;
  const slopeStandardError = Math.sqrt(sse / df / sxx);
  const half = tQuantile(1 - (1 - confidence) / 2, df) * slopeStandardError;
  const low = slope - half;
  const high = slope + half;
  return {
    observations: n,
    df,
    firstYear,
    slope,
    slopeStandardError,
    intercept,
    rSquared: syy > 0 ? 1 - sse / syy : null,
    annualSurvival: { estimate: Math.exp(slope), lower: Math.exp(low), upper: Math.exp(high), confidence },
    decayRate: {
      estimate: -Math.expm1(slope),
      lower: -Math.expm1(high),
      upper: -Math.expm1(low),
      confidence,
    },
    halfLifeYears: slope < 0 ? Math.LN2 / -slope : null,
  };
}
