import { linearRegression, linearRegressionLine, rSquared } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { estimateSeedDecay } from '../../../models/records/decay';
import { RecordsError } from '../../../models/records/records-error';
import { tQuantileReference } from './reference';

// An invented seedbank time series (seeds/m²) from one field left without seed rain, with two
// samples in 2019.
const SERIES = [
  { year: 2015, seedsPerM2: 8200 },
  { year: 2016, seedsPerM2: 5100 },
  { year: 2017, seedsPerM2: 4300 },
  { year: 2018, seedsPerM2: 2300 },
  { year: 2019, seedsPerM2: 1900 },
  { year: 2019, seedsPerM2: 1500 },
  { year: 2021, seedsPerM2: 640 },
];

describe('seed decay by log-linear regression', () => {
  it('matches the slope and intercept of simple-statistics linearRegression on ln density', () => {
    const points = SERIES.map((o) => [o.year - 2015, Math.log(o.seedsPerM2)]);
    const reference = linearRegression(points);
    const fit = estimateSeedDecay(SERIES);
    expect(fit.firstYear).toBe(2015);
    expect(fit.slope).toBeCloseTo(reference.m, 12);
    expect(fit.intercept).toBeCloseTo(reference.b, 12);
    expect(fit.rSquared).toBeCloseTo(rSquared(points, linearRegressionLine(reference)), 12);
    expect(fit.decayRate.estimate).toBeCloseTo(1 - Math.exp(reference.m), 12);
    expect(fit.annualSurvival.estimate).toBeCloseTo(Math.exp(reference.m), 12);
    expect(fit.halfLifeYears).toBeCloseTo(Math.LN2 / -reference.m, 12);
  });

  it("has the slope's t interval mapped through 1 − e^b (interval computed independently)", () => {
    // SE(b) = √(Σ residual² / (n − 2) / Σ(x − x̄)²), residuals from simple-statistics' fitted line,
    // t(0.975; n − 2) from formulajs T.INV.
    const points = SERIES.map((o) => [o.year - 2015, Math.log(o.seedsPerM2)]);
    const line = linearRegressionLine(linearRegression(points));
    const n = points.length;
    const meanX = points.reduce((s, [x]) => s + x, 0) / n;
    const sxx = points.reduce((s, [x]) => s + (x - meanX) ** 2, 0);
    const sse = points.reduce((s, [x, y]) => s + (y - line(x)) ** 2, 0);
    const se = Math.sqrt(sse / (n - 2) / sxx);
    const t = tQuantileReference(0.975, n - 2);
    const b = linearRegression(points).m;
    const fit = estimateSeedDecay(SERIES);
    expect(fit.df).toBe(5);
    expect(fit.slopeStandardError).toBeCloseTo(se, 12);
    expect(fit.decayRate.lower).toBeCloseTo(1 - Math.exp(b + t * se), 7);
    expect(fit.decayRate.upper).toBeCloseTo(1 - Math.exp(b - t * se), 7);
    expect(fit.decayRate.lower).toBeLessThan(fit.decayRate.estimate);
    expect(fit.decayRate.upper).toBeGreaterThan(fit.decayRate.estimate);
  });

  it('recovers an exact exponential decline: S = 5000·0.6^t gives decay 0.4 with no spread', () => {
    // Closed form: ln S = ln 5000 + t·ln 0.6, so b = ln 0.6 and 1 − e^b = 0.4 exactly.
    const exact = [0, 1, 2, 3, 4].map((t) => ({ year: 2010 + t, seedsPerM2: 5000 * 0.6 ** t }));
    const fit = estimateSeedDecay(exact);
    expect(fit.decayRate.estimate).toBeCloseTo(0.4, 12);
    expect(fit.intercept).toBeCloseTo(Math.log(5000), 12);
    expect(fit.decayRate.upper - fit.decayRate.lower).toBeLessThan(1e-12);
    expect(fit.halfLifeYears).toBeCloseTo(Math.LN2 / -Math.log(0.6), 10);
  });

  it('rejects non-positive densities and series too short for an interval', () => {
    let error: unknown;
    try {
      estimateSeedDecay([...SERIES, { year: 2022, seedsPerM2: 0 }, { year: 2023, seedsPerM2: -5 }]);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(RecordsError);
    expect((error as RecordsError).issues.map((i) => i.index)).toEqual([7, 8]);
    expect((error as Error).message).toMatch(
      /record 8: seedbank density must be greater than 0 seeds\/m² to take its logarithm, got 0/,
    );
    expect(() => estimateSeedDecay(SERIES.slice(0, 2))).toThrow(/at least 3 observations, got 2/);
    expect(() =>
      estimateSeedDecay([
        { year: 2020, seedsPerM2: 10 },
        { year: 2020, seedsPerM2: 12 },
        { year: 2020, seedsPerM2: 9 },
      ]),
    ).toThrow(/at least 2 years/);
  });
});
