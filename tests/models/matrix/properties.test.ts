import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeMatrix } from '../../../models/matrix/analysis';
import { mathjsModuliDescending, powerIterationLambda } from './fixtures';

/**
 * Random positive (hence primitive) matrices, sizes 1–7, entries from survival-like 0.001 to
 * fecundity-like 20. fast-check biases towards the bounds, which yields nearly-degenerate cases too.
 */
const positiveMatrix = fc.integer({ min: 1, max: 7 }).chain((n) =>
  fc.array(fc.array(fc.double({ min: 0.001, max: 20, noNaN: true }), { minLength: n, maxLength: n }), {
    minLength: n,
    maxLength: n,
  }),
);

const RUNS = { seed: 20240601, numRuns: 150 };

/** Moduli from mathjs, discarding the sample (fc.pre) when mathjs does not converge. */
function referenceModuli(a: number[][]): number[] {
  const moduli = mathjsModuliDescending(a);
  fc.pre(moduli !== null);
  return moduli as number[];
}

/** |λ2|/λ1 from the reference; 0 for 1×1. */
function referenceRatio(a: number[][]): number {
  const moduli = referenceModuli(a);
  return moduli.length > 1 ? moduli[1] / moduli[0] : 0;
}

function matVec(a: number[][], x: number[]): number[] {
  return a.map((row) => row.reduce((s, aij, j) => s + aij * x[j], 0));
}

function maxAbs(x: number[]): number {
  return Math.max(...x.map(Math.abs));
}

describe('analyzeMatrix on random positive matrices (fast-check)', () => {
  it('λ matches mathjs eigs', () => {
    fc.assert(
      fc.property(positiveMatrix, (a) => {
        const { lambda } = analyzeMatrix(a);
        expect(Math.abs(lambda - referenceModuli(a)[0])).toBeLessThanOrEqual(1e-9 * lambda);
      }),
      RUNS,
    );
  });

  it('λ matches the plain power method where it converges (|λ2|/λ1 < 0.99)', () => {
    // The power method converges like (|λ2|/λ1)^k (Caswell 2001 §4.8); 0.99^5000 ≈ 1e-22.
    fc.assert(
      fc.property(positiveMatrix, (a) => {
        fc.pre(referenceRatio(a) < 0.99);
        const { lambda } = analyzeMatrix(a);
        expect(Math.abs(lambda - powerIterationLambda(a, 5000))).toBeLessThanOrEqual(1e-10 * lambda);
      }),
      RUNS,
    );
  });

  it('w and v are right/left eigenvectors with the documented scaling', () => {
    // Definitions: Aw = λw, vᵀA = λvᵀ (Caswell 2001 §4.4).
    fc.assert(
      fc.property(positiveMatrix, (a) => {
        const { lambda, stableStage: w, reproductiveValue: v } = analyzeMatrix(a);
        const aw = matVec(a, w);
        expect(maxAbs(aw.map((x, i) => x - lambda * w[i]))).toBeLessThanOrEqual(1e-11 * lambda * maxAbs(w));
        const at = a.map((_, i) => a.map((row) => row[i]));
        const va = matVec(at, v);
        expect(maxAbs(va.map((x, i) => x - lambda * v[i]))).toBeLessThanOrEqual(1e-11 * lambda * maxAbs(v));
        expect(w.reduce((s, x) => s + x, 0)).toBeCloseTo(1, 13);
        expect(v[0]).toBe(1);
        // Perron–Frobenius: both vectors are strictly positive for a positive matrix.
        expect(Math.min(...w)).toBeGreaterThan(0);
        expect(Math.min(...v)).toBeGreaterThan(0);
      }),
      RUNS,
    );
  });

  it('elasticities sum to 1 and equal a_ij s_ij / λ', () => {
    // Caswell 2001 §9.2: Σ_ij e_ij = 1 (λ is homogeneous of degree 1 in A — Euler's theorem).
    fc.assert(
      fc.property(positiveMatrix, (a) => {
        const { lambda, sensitivities: s, elasticities: e } = analyzeMatrix(a);
        expect(e.flat().reduce((t, x) => t + x, 0)).toBeCloseTo(1, 12);
        a.forEach((row, i) =>
          row.forEach((aij, j) => expect(e[i][j]).toBeCloseTo((aij * s[i][j]) / lambda, 12)),
        );
      }),
      RUNS,
    );
  });

  it('sensitivities agree with central finite differences of λ (eigenvalues 1 % apart or more)', () => {
    // s_ij = ∂λ/∂a_ij (Caswell 2001 eq. 9.10). Central differences: truncation O(h²), rounding
    // ≈ ε·λ/h; h = 1e-5·max(a_ij, 0.01·max a) keeps both far below the tolerance.
    const withEntry = fc
      .tuple(positiveMatrix, fc.nat(), fc.nat())
      .map(([a, r, c]) => ({ a, i: r % a.length, j: c % a.length }));
    fc.assert(
      fc.property(withEntry, ({ a, i, j }) => {
        fc.pre(referenceRatio(a) < 0.99);
        const { lambda, sensitivities } = analyzeMatrix(a);
        const aMax = Math.max(...a.flat());
        const h = 1e-5 * Math.max(a[i][j], 0.01 * aMax);
        const lambdaAt = (delta: number) => {
          const b = a.map((row) => row.slice());
          b[i][j] += delta;
          return analyzeMatrix(b).lambda;
        };
        const numeric = (lambdaAt(h) - lambdaAt(-h)) / (2 * h);
        const s = sensitivities[i][j];
        expect(Math.abs(numeric - s)).toBeLessThanOrEqual(1e-6 * (Math.abs(s) + lambda / aMax));
      }),
      RUNS,
    );
  });

  it('damping ratio is λ1/|λ2| from mathjs, and exceeds 1', () => {
    fc.assert(
      fc.property(
        positiveMatrix.filter((a) => a.length >= 2),
        (a) => {
          const moduli = referenceModuli(a);
          const { dampingRatio } = analyzeMatrix(a);
          expect(dampingRatio).toBeGreaterThan(1);
          expect(Math.abs(dampingRatio - moduli[0] / moduli[1]) / dampingRatio).toBeLessThan(1e-7);
        },
      ),
      RUNS,
    );
  });
});
