import { hasLifeCycleLoop } from './cycles';
import { perronEigenpair } from './perron';
import { modulus } from './spectrum';
import { assertProjectionMatrix } from './validate';

/**
 * Asymptotic analysis of a projection matrix (Caswell 2001, Matrix Population Models, 2nd ed.,
 * ch. 4 for λ, w, v and the damping ratio; ch. 9 for sensitivities and elasticities).
 * Convention: A[i][j] = contribution of stage j in year t to stage i in year t+1 (column = "from").
 */
export interface MatrixAnalysis {
  /** Dominant eigenvalue λ1: the asymptotic yearly multiplication rate (λ < 1: the program wins). */
  readonly lambda: number;
  /** Right eigenvector w scaled to sum to 1: the stable stage distribution. */
  readonly stableStage: number[];
  /**
   * Left eigenvector v. Scaled so the first entry is 1; when that entry is 0 (the first stage cannot
   * contribute to future growth, e.g. a post-reproductive or dead-end class), scaled so the first
   * entry that is not 0 is 1. Entries below 1e-12 × max(v) count as 0 for that choice, because
   * structurally zero entries come out of floating point as tiny values rather than exact zeros.
   */
  readonly reproductiveValue: number[];
  /** s[i][j] = ∂λ/∂a_ij = v_i w_j / ⟨v, w⟩, for every entry, including those that are 0 in A. */
  readonly sensitivities: number[][];
  /** e[i][j] = (a_ij / λ) s_ij: proportional sensitivities; they sum to 1. */
  readonly elasticities: number[][];
  /**
   * ρ = λ1 / |λ2|, with |λ2| the largest modulus among the other eigenvalues: transients decay like
   * ρ^-t. 1 when λ1 is not strictly dominant (imprimitive/periodic matrices, repeated λ1); never below
   * 1, since |λ2| ≤ λ1 and QR's few-ulp error would otherwise show 0.9999…. Infinity when no other
   * eigenvalue has non-zero modulus; moduli below 1e-6 × λ1 count as zero, because QR returns roots of
   * size ~ε^(1/k)·‖A‖ (≈1e-8 for k = 2) for a zero eigenvalue of multiplicity k.
   */
  readonly dampingRatio: number;
}

const REPRODUCTIVE_ZERO_RELATIVE = 1e-12;
const SECOND_MODULUS_ZERO_RELATIVE = 1e-6;
/**
 * cos∠(v, w) below this means λ1 is (numerically) a defective repeated eigenvalue: its condition
 * number ‖v‖‖w‖/⟨v,w⟩ exceeds 1e8, and the derivative of λ does not exist in the limit.
 */
const MIN_EIGENVECTOR_COSINE = 1e-8;

/**
 * Throws RangeError when the matrix is invalid (not square, empty, non-finite or negative entries),
 * has no life-cycle loop (λ = 0), or has a defective repeated dominant eigenvalue.
 */
export function analyzeMatrix(matrix: readonly (readonly number[])[]): MatrixAnalysis {
  assertProjectionMatrix(matrix);
  if (!hasLifeCycleLoop(matrix)) {
    throw new RangeError(
      'projection matrix has no life-cycle loop (it is nilpotent: every line dies out within ' +
        `${matrix.length} years), so λ = 0 and the stable stage, sensitivities and elasticities are undefined`,
    );
  }
  const n = matrix.length;
  const { lambda, right: w, left, spectrum, dominantIndex } = perronEigenpair(matrix);

  const vw = dot(left, w);
  if (vw < MIN_EIGENVECTOR_COSINE * Math.hypot(...left) * Math.hypot(...w)) {
    throw new RangeError(
      'dominant eigenvalue is repeated and defective (left and right eigenvectors are orthogonal), ' +
        'typically a reducible matrix whose top growth rate occurs in two linked blocks; ' +
        'sensitivities and elasticities of λ are undefined',
    );
  }

  const vMax = Math.max(...left);
  const scaleIndex = left.findIndex((x) => x > REPRODUCTIVE_ZERO_RELATIVE * vMax);
  const reproductiveValue = Array.from(left, (x) => x / left[scaleIndex]);

  const sensitivities: number[][] = [];
  const elasticities: number[][] = [];
  for (let i = 0; i < n; i++) {
    const sRow: number[] = [];
    const eRow: number[] = [];
    for (let j = 0; j < n; j++) {
      const s = (left[i] * w[j]) / vw;
      sRow.push(s);
      eRow.push((matrix[i][j] * s) / lambda);
    }
    sensitivities.push(sRow);
    elasticities.push(eRow);
  }

  let secondModulus = 0;
  spectrum.forEach((z, k) => {
    if (k !== dominantIndex) secondModulus = Math.max(secondModulus, modulus(z));
  });
  const dampingRatio =
    secondModulus <= SECOND_MODULUS_ZERO_RELATIVE * lambda ? Infinity : Math.max(1, lambda / secondModulus);

  return { lambda, stableStage: Array.from(w), reproductiveValue, sensitivities, elasticities, dampingRatio };
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}
