import * as formulajs from '@formulajs/formulajs';
import chisquareQuantile from '@stdlib/stats-base-dists-chisquare-quantile';
import poissonPmf from '@stdlib/stats-base-dists-poisson-pmf';
import { describe, expect, it } from 'vitest';
import { exactPoissonInterval } from '../../../models/records/poisson-interval';

/** P(X ≤ x) for X ~ Poisson(mean), summed from @stdlib's pmf. */
function poissonCdf(x: number, mean: number): number {
  let sum = 0;
  for (let i = 0; i <= x; i++) sum += poissonPmf(i, mean);
  return sum;
}

describe('exact Poisson confidence limits (Garwood 1936)', () => {
  it('match published exact Poisson table values at 95 %', () => {
    // Standard table of exact 95 % limits for a Poisson count (e.g. Pearson & Hartley, Biometrika
    // Tables for Statisticians vol. 1) (values recalled from memory), compared to the printed digits.
    const table: [number, string, string][] = [
      [0, '0', '3.689'],
      [1, '0.0253', '5.572'],
      [2, '0.2422', '7.225'],
      [5, '1.623', '11.67'],
      [10, '4.795', '18.39'],
    ];
    const significant = (printed: string): number => printed.replace(/^[0.]+/, '').replace('.', '').length;
    for (const [x, lower, upper] of table) {
      const got = exactPoissonInterval(x);
      expect(x === 0 ? String(got.lower) : got.lower.toPrecision(significant(lower))).toBe(lower);
      expect(got.upper.toPrecision(significant(upper))).toBe(upper);
    }
  });

  it('equals the Garwood chi-square relation computed with @stdlib and with formulajs', () => {
    // Garwood (1936), Biometrika 28:437–442: lower = χ²(α/2; 2x)/2, upper = χ²(1 − α/2; 2x + 2)/2.
    // @stdlib's quantile is compared only up to 2x + 2 < 2000 df: beyond, its incomplete gamma uses
    // a large-x series that drifts by ~1e-4 near the centre (see models/records/chi-square.ts);
    // formulajs (jStat), an independent implementation, is compared everywhere.
    for (const confidence of [0.9, 0.95, 0.99]) {
      const tail = (1 - confidence) / 2;
      for (const x of [1, 3, 7, 20, 150, 4000]) {
        const got = exactPoissonInterval(x, confidence);
        if (2 * x + 2 < 2000) {
          expect(got.lower / (chisquareQuantile(tail, 2 * x) / 2)).toBeCloseTo(1, 10);
          expect(got.upper / (chisquareQuantile(1 - tail, 2 * x + 2) / 2)).toBeCloseTo(1, 10);
        }
        expect(got.lower / (formulajs.CHISQ.INV(tail, 2 * x) / 2)).toBeCloseTo(1, 9);
        expect(got.upper / (formulajs.CHISQ.INV(1 - tail, 2 * x + 2) / 2)).toBeCloseTo(1, 9);
      }
    }
  });

  it('puts exactly α/2 in each Poisson tail at the limits (the definition of the exact interval)', () => {
    // Closed form: the upper limit μU solves P(X ≤ x | μU) = α/2, the lower μL solves P(X ≥ x | μL) = α/2;
    // checked with @stdlib's Poisson pmf, which does not use the chi-square relation.
    for (const x of [0, 1, 4, 12, 60, 1000, 4000]) {
      const { lower, upper } = exactPoissonInterval(x, 0.95);
      expect(poissonCdf(x, upper)).toBeCloseTo(0.025, 9);
      if (x > 0) expect(1 - poissonCdf(x - 1, lower)).toBeCloseTo(0.025, 9);
    }
  });

  it('rejects counts that are not whole numbers ≥ 0 and bad confidence levels', () => {
    expect(() => exactPoissonInterval(-1)).toThrow(/whole number ≥ 0/);
    expect(() => exactPoissonInterval(2.5)).toThrow(/whole number ≥ 0/);
    expect(() => exactPoissonInterval(3, 1)).toThrow(/confidence level/);
  });
});
