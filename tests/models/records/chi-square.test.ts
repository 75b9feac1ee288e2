import * as formulajs from '@formulajs/formulajs';
import chisquareCdf from '@stdlib/stats-base-dists-chisquare-cdf';
import chisquareQuantile from '@stdlib/stats-base-dists-chisquare-quantile';
import { describe, expect, it } from 'vitest';
import { chiSquareQuantile, chiSquareUpperTail } from '../../../models/records/chi-square';

describe('chi-square tail and quantile', () => {
  it('match printed chi-square table critical values', () => {
    // Upper 5 % and 1 % points of χ² (any statistics table, e.g. Fisher & Yates, Statistical Tables,
    // table IV) (values recalled from memory).
    const table: [number, number, string][] = [
      [1, 0.95, '3.841'],
      [1, 0.99, '6.635'],
      [9, 0.95, '16.919'],
      [10, 0.95, '18.307'],
      [30, 0.99, '50.892'],
      [100, 0.95, '124.342'],
    ];
    for (const [df, p, printed] of table) expect(chiSquareQuantile(p, df).toFixed(3)).toBe(printed);
  });

  it('agree with @stdlib below 2000 df and with formulajs (jStat) everywhere', () => {
    for (const df of [0.5, 1, 2, 5, 19, 150, 999, 4001, 50_000]) {
      for (const p of [1e-6, 0.025, 0.5, 0.975, 1 - 1e-6]) {
        const x = chiSquareQuantile(p, df);
        expect(x / formulajs.CHISQ.INV(p, df)).toBeCloseTo(1, 9);
        if (df < 2000) {
          expect(x / chisquareQuantile(p, df)).toBeCloseTo(1, 10);
          expect(chiSquareUpperTail(x, df)).toBeCloseTo(1 - chisquareCdf(x, df), 10);
        }
      }
    }
  });

  it('is the inverse of the upper tail, with relative precision in small tails', () => {
    for (const df of [1, 3, 40, 3000]) {
      for (const q of [1e-6, 1e-4, 0.05]) {
        // P(χ² > quantile(1 − q)) = q to 1e-9 of q itself (not just of 1); smaller q would test the
        // rounding of 1 − q rather than the quantile.
        expect(chiSquareUpperTail(chiSquareQuantile(1 - q, df), df) / q).toBeCloseTo(1, 9);
      }
    }
  });

  it('has the closed form P(χ²₂ > x) = e^(−x/2) for two degrees of freedom', () => {
    // χ² with 2 df is exponential with mean 2.
    for (const x of [0.01, 1, 7.5, 60])
      expect(chiSquareUpperTail(x, 2) / Math.exp(-x / 2)).toBeCloseTo(1, 12);
  });

  it('rejects impossible arguments', () => {
    expect(() => chiSquareQuantile(0, 3)).toThrow(/in \(0, 1\)/);
    expect(() => chiSquareQuantile(0.5, 0)).toThrow(/degrees of freedom/);
    expect(() => chiSquareUpperTail(1, -2)).toThrow(/degrees of freedom/);
  });
});
