import * as formulajs from '@formulajs/formulajs';
import binomialPmf from '@stdlib/stats-base-dists-binomial-pmf';
import { describe, expect, it } from 'vitest';
import { binomialInterval } from '../../../models/records/binomial-interval';

function binomialCdf(x: number, n: number, p: number): number {
  let sum = 0;
  for (let i = 0; i <= x; i++) sum += binomialPmf(i, n, p);
  return sum;
}

// Newcombe (1998), "Two-sided confidence intervals for the single proportion: comparison of seven
// methods", Stat. Med. 17:857–872, Table I: 95 % limits for four example proportions, method 3
// (Wilson score, no continuity correction) and method 5 (exact, Clopper–Pearson)
// (values recalled from memory).
const NEWCOMBE_TABLE_I: { x: number; n: number; wilson: [number, number]; exact: [number, number] }[] = [
  { x: 81, n: 263, wilson: [0.2553, 0.3662], exact: [0.2527, 0.3676] },
  { x: 15, n: 148, wilson: [0.0624, 0.1605], exact: [0.0578, 0.1617] },
  { x: 0, n: 20, wilson: [0, 0.1611], exact: [0, 0.1684] },
  { x: 1, n: 29, wilson: [0.0061, 0.1718], exact: [0.0009, 0.1776] },
];

describe('binomial intervals', () => {
  it("reproduce Newcombe's (1998) Table I to the published four decimals", () => {
    for (const row of NEWCOMBE_TABLE_I) {
      const wilson = binomialInterval(row.x, row.n, 'wilson');
      expect([wilson.lower.toFixed(4), wilson.upper.toFixed(4)]).toEqual(row.wilson.map((v) => v.toFixed(4)));
      const exact = binomialInterval(row.x, row.n, 'clopper-pearson');
      expect([exact.lower.toFixed(4), exact.upper.toFixed(4)]).toEqual(row.exact.map((v) => v.toFixed(4)));
    }
  });

  it('Clopper–Pearson limits equal beta quantiles from formulajs and leave α/2 in each binomial tail', () => {
    // Clopper & Pearson (1934), Biometrika 26:404–413: P(X ≥ x | pL) = α/2, P(X ≤ x | pU) = α/2;
    // equivalently pL = B(α/2; x, n − x + 1), pU = B(1 − α/2; x + 1, n − x). Tails from @stdlib's pmf.
    for (const [x, n] of [
      [3, 10],
      [17, 40],
      [99, 100],
      [250, 1000],
    ]) {
      const ci = binomialInterval(x, n, 'clopper-pearson', 0.9);
      expect(ci.lower).toBeCloseTo(formulajs.BETA.INV(0.05, x, n - x + 1), 6);
      expect(ci.upper).toBeCloseTo(formulajs.BETA.INV(0.95, x + 1, n - x), 6);
      expect(1 - binomialCdf(x - 1, n, ci.lower)).toBeCloseTo(0.05, 8);
      expect(binomialCdf(x, n, ci.upper)).toBeCloseTo(0.05, 8);
    }
  });

  it('Wilson limits are where the score statistic equals z (Wilson 1927, inverted score test)', () => {
    // Closed form: at a limit p, |x/n − p| / √(p(1 − p)/n) = z(1 − α/2); z from formulajs NORM.S.INV.
    const z = formulajs.NORM.S.INV(0.995);
    for (const [x, n] of [
      [1, 8],
      [12, 30],
      [640, 700],
    ]) {
      const ci = binomialInterval(x, n, 'wilson', 0.99);
      for (const p of [ci.lower, ci.upper]) {
        expect(Math.abs(x / n - p) / Math.sqrt((p * (1 - p)) / n)).toBeCloseTo(z, 9);
      }
    }
  });

  it('ends at exactly 0 and 1 for none and all successes', () => {
    for (const method of ['wilson', 'clopper-pearson'] as const) {
      expect(binomialInterval(0, 12, method).lower).toBe(0);
      expect(binomialInterval(12, 12, method).upper).toBe(1);
    }
  });

  it('rejects impossible counts', () => {
    expect(() => binomialInterval(5, 4)).toThrow(/from 0 to 4/);
    expect(() => binomialInterval(-1, 4)).toThrow(/from 0 to 4/);
    expect(() => binomialInterval(0, 0)).toThrow(/trials ≥ 1/);
  });
});
