import { balanceInPlace, reduceToHessenbergInPlace } from './hessenberg';
import { hessenbergEigenvaluesInPlace } from './hqr';

export interface Complex {
  readonly re: number;
  readonly im: number;
}

/**
 * All n eigenvalues (with multiplicity, complex pairs adjacent) of a real square matrix:
 * balance → Hessenberg → shifted QR. The projection-matrix analysis needs the whole spectrum for the
 * damping ratio (|λ2|) and a trustworthy λ1 to shift the eigenvector iteration.
 * The input is not modified. Order is the solver's, not sorted.
 */
export function eigenvalues(matrix: readonly (readonly number[])[]): Complex[] {
  const a = matrix.map((row) => Float64Array.from(row));
  balanceInPlace(a);
  reduceToHessenbergInPlace(a);
  const { re, im } = hessenbergEigenvaluesInPlace(a);
  return Array.from(re, (value, k) => ({ re: value, im: im[k] }));
}

export function modulus(z: Complex): number {
  return Math.hypot(z.re, z.im);
}
