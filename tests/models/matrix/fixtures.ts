/**
 * Published projection matrices used as worked examples, with helpers that are independent of the
 * code under test (plain power iteration, mathjs eigenvalues).
 */
import { eigs, type Complex as MathComplex } from 'mathjs';

/**
 * Loggerhead sea turtle, seven stages (eggs/hatchlings, small juveniles, large juveniles, subadults,
 * novice breeders, 1st-yr remigrants, mature breeders): Crouse, Crowder & Caswell 1987, Ecology
 * 68:1412–1423, Table 4; also used in Caswell 2001, Matrix Population Models, 2nd ed.
 * Entries as printed in the paper (the same matrix appears in many teaching materials).
 */
export const LOGGERHEAD: number[][] = [
  [0, 0, 0, 0, 127, 4, 80],
  [0.6747, 0.737, 0, 0, 0, 0, 0],
  [0, 0.0486, 0.661, 0, 0, 0, 0],
  [0, 0, 0.0147, 0.6907, 0, 0, 0],
  [0, 0, 0, 0.0518, 0, 0, 0],
  [0, 0, 0, 0, 0.8091, 0, 0],
  [0, 0, 0, 0, 0, 0.8091, 0.8089],
];

/**
 * Killer whale (yearling, juvenile, mature female, post-reproductive female): Brault & Caswell 1993,
 * Ecology 74:1444–1454, as Example 5.1 of Caswell 2001. Reducible: the post-reproductive class
 * receives individuals but never contributes to future growth.
 */
export const KILLER_WHALE: number[][] = [
  [0, 0.0043, 0.1132, 0],
  [0.9775, 0.9111, 0, 0],
  [0, 0.0736, 0.9534, 0],
  [0, 0, 0.0452, 0.9804],
];

/**
 * Teasel (Dipsacus sylvestris), six stages from two dormant-seed classes to flowering plants:
 * Werner & Caswell 1977 as used in Caswell 2001 (Example 5.2). A weed with a seedbank — the kind of
 * matrix Seedwake builds.
 */
export const TEASEL: number[][] = [
  [0, 0, 0, 0, 0, 322.38],
  [0.966, 0, 0, 0, 0, 0],
  [0.013, 0.01, 0.125, 0, 0, 3.448],
  [0.007, 0, 0.125, 0.238, 0, 30.17],
  [0.008, 0, 0, 0.245, 0.167, 0.862],
  [0, 0, 0, 0.023, 0.75, 0],
];

/** Textbook power method (Caswell 2001 §4.8): x ← Ax/Σ(Ax); λ ≈ Σ(Ax)/Σx. Only for primitive A. */
export function powerIterationLambda(a: number[][], iterations = 5000): number {
  const n = a.length;
  let x = new Array<number>(n).fill(1 / n);
  let lambda = 0;
  for (let k = 0; k < iterations; k++) {
    const y = a.map((row) => row.reduce((s, aij, j) => s + aij * x[j], 0));
    lambda = y.reduce((s, v) => s + v, 0);
    x = y.map((v) => v / lambda);
  }
  return lambda;
}

export interface PlainComplex {
  re: number;
  im: number;
}

/**
 * Eigenvalues from mathjs (values only, so defective matrices do not trip its eigenvector step), or
 * null when mathjs gives up. mathjs 15.2 `eigs` throws "The eigenvalues failed to converge" on about
 * 3–4 % of random positive 2×2–7×7 matrices (measured on 500 fast-check samples), so property tests
 * discard those samples rather than treat the reference as wrong.
 */
export function mathjsEigenvalues(a: number[][]): PlainComplex[] | null {
  let values: (number | MathComplex)[];
  try {
    values = eigs(a, { eigenvectors: false }).values as unknown as (number | MathComplex)[];
  } catch {
    return null;
  }
  return values.map((z) => (typeof z === 'number' ? { re: z, im: 0 } : { re: z.re, im: z.im }));
}

/** Largest real part among mathjs eigenvalues = Perron root for a non-negative matrix. */
export function mathjsPerronRoot(a: number[][]): number {
  const values = mathjsEigenvalues(a);
  if (values === null) throw new Error('mathjs eigs did not converge on a fixed example');
  return Math.max(...values.map((z) => z.re));
}

/** Eigenvalue moduli from mathjs, largest first, or null when mathjs does not converge. */
export function mathjsModuliDescending(a: number[][]): number[] | null {
  const values = mathjsEigenvalues(a);
  return values === null ? null : values.map((z) => Math.hypot(z.re, z.im)).sort((x, y) => y - x);
}
