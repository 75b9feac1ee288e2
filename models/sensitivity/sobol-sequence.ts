// The Sobol' low-discrepancy sequence (Sobol' 1967, USSR Comput. Math. Math. Phys. 7:86–112) in
// up to 101 dimensions with Joe & Kuo's (2008) direction numbers, generated in Gray-code order
// (Antonov & Saleev 1979) as in Bratley & Fox (1988, ACM TOMS 14:88–100), 32 bits per coordinate.
//
// With a Sampler it is randomised by Matoušek's (1998, J. Complexity 14:527–556) linear matrix
// scramble plus a digital shift: each dimension's direction numbers are multiplied by a random
// lower-triangular binary matrix with unit diagonal, and every point is XOR-ed with a random
// 32-bit shift. That keeps the (t, m, s)-net balance of the sequence, makes every point uniform on
// [0, 1)^d, and gives a different, reproducible sample for each seed. The first point is kept
// (after scrambling it is not the origin; dropping it would spoil the balance — Owen 2022,
// "On dropping the first Sobol' point").
import type { Sampler } from '../random/sampler';
import { JOE_KUO_DIRECTIONS } from './sobol-directions';

const BITS = 32;
const TWO_POW_32 = 4294967296;

/** Dimensions available: van der Corput's first, then one per row of Joe & Kuo's table. */
export const SOBOL_MAX_DIMENSIONS = JOE_KUO_DIRECTIONS.length + 1;
/** A Sobol' design takes 2·k dimensions (A and B side by side, Saltelli 2010). */
export const SOBOL_MAX_PARAMETERS = Math.floor(SOBOL_MAX_DIMENSIONS / 2);

/** V_1..V_32 of one dimension (0-based), each a 32-bit binary fraction: V_k = m_k / 2^k. */
function directionNumbers(dimension: number): Uint32Array {
  const v = new Uint32Array(BITS);
  if (dimension === 0) {
    for (let k = 0; k < BITS; k++) v[k] = 2 ** (BITS - 1 - k);
    return v;
  }
  const [, s, a, m] = JOE_KUO_DIRECTIONS[dimension - 1];
  for (let k = 0; k < s; k++) v[k] = m[k] * 2 ** (BITS - 1 - k);
  // The recurrence of the primitive polynomial x^s + a_1 x^(s−1) + … + a_(s−1) x + 1, with a's
  // bits a_1 … a_(s−1) from most to least significant (Joe & Kuo's convention).
  for (let k = s; k < BITS; k++) {
    let next = v[k - s] ^ (v[k - s] >>> s);
    for (let j = 1; j < s; j++) {
      if ((a >>> (s - 1 - j)) & 1) next ^= v[k - j];
    }
    v[k] = next;
  }
  return v;
}

function parity(x: number): number {
  x ^= x >>> 16;
  x ^= x >>> 8;
  x ^= x >>> 4;
  x ^= x >>> 2;
  x ^= x >>> 1;
  return x & 1;
}

function randomWord(sampler: Sampler): number {
  return Math.floor(sampler.uniform() * TWO_POW_32);
}

/**
 * L·v over GF(2) for a random lower-triangular L with unit diagonal, bit 31 being the most
 * significant digit: output digit r depends on input digits 0..r only.
 */
function scrambleDirections(v: Uint32Array, rows: Uint32Array): void {
  for (let k = 0; k < BITS; k++) {
    let out = 0;
    for (let r = 0; r < BITS; r++) out |= parity(rows[r] & v[k]) << (BITS - 1 - r);
    v[k] = out >>> 0;
  }
}

function randomLowerTriangular(sampler: Sampler): Uint32Array {
  const rows = new Uint32Array(BITS);
  rows[0] = 2 ** (BITS - 1);
  for (let r = 1; r < BITS; r++) {
    const above = (0xffffffff << (BITS - r)) >>> 0; // digits more significant than r
    rows[r] = ((randomWord(sampler) & above) | (1 << (BITS - 1 - r))) >>> 0;
  }
  return rows;
}

/**
 * The first n points of the d-dimensional Sobol' sequence, as rows in [0, 1)^d; scrambled when a
 * Sampler is given (d matrices and d shifts drawn from it, in dimension order), plain otherwise.
 */
export function sobolSequence(n: number, dimensions: number, scramble?: Sampler): number[][] {
  if (!Number.isInteger(dimensions) || dimensions < 1 || dimensions > SOBOL_MAX_DIMENSIONS) {
    throw new RangeError(
      `sobol dimensions must be an integer in [1, ${SOBOL_MAX_DIMENSIONS}], got ${dimensions}`,
    );
  }
  if (!Number.isInteger(n) || n < 0 || n > TWO_POW_32) {
    throw new RangeError(`sobol point count must be an integer in [0, 2^32], got ${n}`);
  }
  const directions: Uint32Array[] = [];
  const shifts = new Uint32Array(dimensions);
  for (let j = 0; j < dimensions; j++) {
    const v = directionNumbers(j);
    if (scramble) {
      scrambleDirections(v, randomLowerTriangular(scramble));
      shifts[j] = randomWord(scramble);
    }
    directions.push(v);
  }
  const state = new Uint32Array(dimensions);
  const points: number[][] = [];
  for (let i = 0; i < n; i++) {
    if (i > 0) {
      // Gray-code step: point i differs from point i − 1 by the direction of i's lowest set bit.
      let c = 0;
      for (let q = i; q % 2 === 0; q /= 2) c++;
      for (let j = 0; j < dimensions; j++) state[j] ^= directions[j][c];
    }
    const row = new Array<number>(dimensions);
    for (let j = 0; j < dimensions; j++) row[j] = ((state[j] ^ shifts[j]) >>> 0) / TWO_POW_32;
    points.push(row);
  }
  return points;
}
