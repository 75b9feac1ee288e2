import { describe, expect, it } from 'vitest';
import type { SweepParameter } from '../../../models/sensitivity/design';
import { designPoints } from '../../../models/sensitivity/points';
import { sobolIndices } from '../../../models/sensitivity/sobol';

// Ishigami & Homma (1990), "An importance quantification technique in uncertainty analysis for
// computer models", Proc. ISUMA '90: f = sin x1 + a·sin² x2 + b·x3⁴·sin x1, x_i ~ U(−π, π).
// Closed-form partial variances, from integrating f over the independent uniform inputs (also
// tabulated in Saltelli et al. 2008, Global Sensitivity Analysis: The Primer — recalled from memory):
//   V = a²/8 + b·π⁴/5 + b²·π⁸/18 + 1/2,  V1 = ½(1 + b·π⁴/5)²,  V2 = a²/8,  V3 = 0,
//   V13 = b²·π⁸·(1/18 − 1/50),  V12 = V23 = V123 = 0.
const A = 7;
const B = 0.1;
const PI4 = Math.PI ** 4;
const PI8 = Math.PI ** 8;
const V = (A * A) / 8 + (B * PI4) / 5 + (B * B * PI8) / 18 + 0.5;
const V1 = 0.5 * (1 + (B * PI4) / 5) ** 2;
const V2 = (A * A) / 8;
const V13 = B * B * PI8 * (1 / 18 - 1 / 50);
const analytic = {
  first: [V1 / V, V2 / V, 0],
  total: [(V1 + V13) / V, V2 / V, V13 / V],
};

function ishigami([x1, x2, x3]: number[]): number {
  return Math.sin(x1) + A * Math.sin(x2) ** 2 + B * x3 ** 4 * Math.sin(x1);
}

const ishigamiParams: SweepParameter[] = ['x1', 'x2', 'x3'].map((path) => ({
  path,
  min: -Math.PI,
  max: Math.PI,
  base: 0,
}));

describe('Sobol indices on the Ishigami function (a = 7, b = 0.1)', () => {
  const seed = 20240611;
  const points = designPoints(ishigamiParams, { kind: 'sobol', baseSamples: 2 ** 13 }, seed);
  const analysis = sobolIndices(ishigamiParams, points.map(ishigami), seed, { bootstrapDraws: 500 });

  it('has the closed-form values the literature quotes', () => {
    // Published rounded values: S1 ≈ 0.314, S2 ≈ 0.442, S3 = 0, ST1 ≈ 0.558, ST2 ≈ 0.442,
    // ST3 ≈ 0.244 (Saltelli et al. 2010, Comput. Phys. Commun. 181:259–270; values recalled from memory).
    expect(analytic.first[0]).toBeCloseTo(0.314, 3);
    expect(analytic.first[1]).toBeCloseTo(0.442, 3);
    expect(analytic.total[0]).toBeCloseTo(0.558, 3);
    expect(analytic.total[2]).toBeCloseTo(0.244, 3);
  });

  it('recovers every first-order and total index inside its bootstrap interval and within 0.02', () => {
    expect(analysis.baseSamples).toBe(2 ** 13);
    // The outcome variance estimate itself against the closed-form V.
    expect(Math.abs(analysis.variance - V) / V).toBeLessThan(0.02);
    analysis.indices.forEach((index, i) => {
      for (const [estimate, exact] of [
        [index.first, analytic.first[i]],
        [index.total, analytic.total[i]],
      ] as const) {
        expect(estimate.low).toBeLessThanOrEqual(exact);
        expect(estimate.high).toBeGreaterThanOrEqual(exact);
        expect(Math.abs(estimate.value - exact)).toBeLessThan(0.02);
        // An interval wide enough to contain anything would make the check above empty.
        expect(estimate.high - estimate.low).toBeLessThan(0.1);
      }
    });
  });

  it('gives the same intervals for the same seed and different ones for another', () => {
    const outcomes = points.map(ishigami);
    const again = sobolIndices(ishigamiParams, outcomes, seed, { bootstrapDraws: 50 });
    const same = sobolIndices(ishigamiParams, outcomes, seed, { bootstrapDraws: 50 });
    const other = sobolIndices(ishigamiParams, outcomes, seed + 1, { bootstrapDraws: 50 });
    expect(same).toEqual(again);
    expect(other.indices[0].first.low).not.toBe(again.indices[0].first.low);
    // The point estimates do not depend on the bootstrap.
    expect(other.indices.map((x) => x.total.value)).toEqual(again.indices.map((x) => x.total.value));
  });
});

describe('Sobol indices of an additive model', () => {
  it('match S_i = ST_i = c_i² / Σ c_j² for y = Σ c_i·x_i, x_i ~ U(0, 1), over 50 parameters', () => {
    // Closed form: for independent inputs Var(Σ c_i x_i) = Σ c_i²·Var(x_i), Var(x_i) = 1/12, and
    // an additive model has no interactions, so V_i = c_i²/12 = V_Ti. 50 parameters use 100 of the
    // 101 dimensions of the Sobol' sequence behind the A and B matrices.
    const k = 50;
    const c = Array.from({ length: k }, (_, i) => (i % 5 === 0 ? 10 : 1 + (i % 3)));
    const sumSquares = c.reduce((s, ci) => s + ci * ci, 0);
    const params = c.map((_, i) => ({ path: `p${i}`, min: 0, max: 1, base: 0.5 }));
    const points = designPoints(params, { kind: 'sobol', baseSamples: 2 ** 10 }, 7);
    const outcomes = points.map((x) => x.reduce((s, xi, i) => s + c[i] * xi, 0));
    const analysis = sobolIndices(params, outcomes, 7, { bootstrapDraws: 200 });
    analysis.indices.forEach((index, i) => {
      const exact = (c[i] * c[i]) / sumSquares;
      expect(Math.abs(index.first.value - exact)).toBeLessThan(0.01);
      expect(Math.abs(index.total.value - exact)).toBeLessThan(0.01);
      expect(index.first.low).toBeLessThanOrEqual(exact);
      expect(index.first.high).toBeGreaterThanOrEqual(exact);
      expect(index.total.low).toBeLessThanOrEqual(exact);
      expect(index.total.high).toBeGreaterThanOrEqual(exact);
    });
  });
});

describe('sobolIndices input handling', () => {
  const params: SweepParameter[] = [
    { path: 'a', min: 0, max: 1, base: 0.5 },
    { path: 'b', min: 0, max: 1, base: 0.5 },
  ];

  it('analyses any whole number of leading blocks (a running sweep) and refuses partial blocks', () => {
    const points = designPoints(params, { kind: 'sobol', baseSamples: 64 }, 3);
    const outcomes = points.map(([a, b]) => a + 2 * b);
    expect(sobolIndices(params, outcomes.slice(0, 4 * 10), 3, { bootstrapDraws: 20 }).baseSamples).toBe(10);
    expect(() => sobolIndices(params, outcomes.slice(0, 4 * 10 + 1), 3)).toThrow(/whole blocks of 4/);
    expect(() => sobolIndices(params, outcomes.slice(0, 4), 3)).toThrow(RangeError);
  });

  it('reports NaN indices (undefined) for a constant outcome and names a non-finite point', () => {
    const constant = sobolIndices(params, new Array(4 * 8).fill(5), 1, { bootstrapDraws: 10 });
    expect(constant.variance).toBe(0);
    expect(constant.indices[0].first.value).toBeNaN();
    expect(constant.indices[1].total.high).toBeNaN();
    const outcomes = new Array(4 * 8).fill(1).map((_, i) => i);
    outcomes[9] = NaN;
    expect(() => sobolIndices(params, outcomes, 1)).toThrow(/point 9/);
  });
});
