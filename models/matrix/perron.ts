import { luFactor, luSolve } from './lu';
import { eigenvalues, type Complex } from './spectrum';

/**
 * Dominant (Perron) eigenvalue of a non-negative matrix with its right and left eigenvectors.
 *
 * Why not plain power iteration on A and Aᵀ: it converges at the rate |λ2|/λ1, which for seedbank
 * models with slow seed decay sits close to 1, and it never converges for imprimitive (periodic)
 * matrices such as an annual without carry-over, where |λ2| = λ1. Instead:
 *  1. the full spectrum (balanced Hessenberg QR) gives λ1 — for a non-negative matrix the Perron root
 *     is real and has the largest real part — and |λ2| for the damping ratio;
 *  2. each eigenvector comes from inverse iteration, i.e. power iteration on (μI − A)⁻¹ with μ just
 *     above λ1. Its rate is (μ − λ1)/min|μ − λi| (about 1e-10/gap), so 3–4 steps reach rounding level
 *     whatever |λ2|/λ1 is, periodic matrices included. Because μ exceeds the spectral radius,
 *     (μI − A)⁻¹ = Σ Aᵏ/μᵏ⁺¹ is entrywise non-negative, so iterates started from a positive vector stay
 *     non-negative — the Perron vector, not some other vector of the eigenspace.
 * Iteration stops when the residual ‖Ax − λ̂x‖∞ is at rounding level relative to ‖A‖∞‖x‖∞
 * (λ̂ = Σ(Ax)/Σx), after at least MIN_ITERATIONS steps so components along other eigenvalues, which
 * shrink by ~1e-10/gap per step, are driven far below anything reported.
 */

const SHIFT_RELATIVE = 1e-10;
const MIN_ITERATIONS = 3;
const MAX_ITERATIONS = 50;
const RESIDUAL_TOLERANCE = 1e-12;

export interface PerronEigenpair {
  /** Dominant eigenvalue, refined from the right eigenvector as Σ(Aw)/Σw. */
  readonly lambda: number;
  /** Right eigenvector, non-negative (up to rounding of structural zeros), sums to 1. */
  readonly right: Float64Array;
  /** Left eigenvector, non-negative (up to rounding of structural zeros), sums to 1. */
  readonly left: Float64Array;
  /** All eigenvalues as returned by the QR solver (λ1 included). */
  readonly spectrum: Complex[];
  /** Position of λ1 in `spectrum`. */
  readonly dominantIndex: number;
}

/** Caller guarantees a validated non-negative square matrix whose graph has a loop (λ1 > 0). */
export function perronEigenpair(matrix: readonly (readonly number[])[]): PerronEigenpair {
  const spectrum = eigenvalues(matrix);
  let dominantIndex = 0;
  for (let k = 1; k < spectrum.length; k++) {
    if (spectrum[k].re > spectrum[dominantIndex].re) dominantIndex = k;
  }
  const lambdaQr = spectrum[dominantIndex].re;
  const a = matrix.map((row) => Float64Array.from(row));
  const transposed = a.map((_, i) => Float64Array.from(a, (row) => row[i]));
  // λ1 > 0 here, so a relative shift keeps μ strictly above it.
  const mu = lambdaQr * (1 + SHIFT_RELATIVE);
  const right = inverseIteration(a, mu);
  const left = inverseIteration(transposed, mu);
  const lambda = sum(multiply(a, right)); // Σw = 1
  return { lambda, right, left, spectrum, dominantIndex };
}

function inverseIteration(a: Float64Array[], mu: number): Float64Array {
  const n = a.length;
  const normInf = Math.max(...a.map(sum));
  const shifted = a.map((row, i) => {
    const r = row.map((x) => -x);
    r[i] += mu;
    return r;
  });
  const factors = luFactor(shifted);
  let x: Float64Array = new Float64Array(n).fill(1 / n);
  for (let iteration = 1; iteration <= MAX_ITERATIONS; iteration++) {
    const y = luSolve(factors, x);
    const total = sum(y);
    for (let i = 0; i < n; i++) y[i] /= total;
    x = y;
    if (iteration >= MIN_ITERATIONS && relativeResidual(a, x, normInf) <= RESIDUAL_TOLERANCE) return x;
  }
  throw new Error(
    `inverse iteration for the dominant eigenvector did not converge in ${MAX_ITERATIONS} steps`,
  );
}

function relativeResidual(a: Float64Array[], x: Float64Array, normInf: number): number {
  const ax = multiply(a, x);
  const lambda = sum(ax) / sum(x);
  let residual = 0;
  let xMax = 0;
  for (let i = 0; i < x.length; i++) {
    residual = Math.max(residual, Math.abs(ax[i] - lambda * x[i]));
    xMax = Math.max(xMax, x[i]);
  }
  return residual / (normInf * xMax);
}

function multiply(a: Float64Array[], x: Float64Array): Float64Array {
  return Float64Array.from(a, (row) => row.reduce((s, aij, j) => s + aij * x[j], 0));
}

function sum(x: Float64Array): number {
  return x.reduce((s, v) => s + v, 0);
}
