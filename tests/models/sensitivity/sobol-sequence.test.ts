import { describe, expect, it } from 'vitest';
import { Sampler } from '../../../models/random/sampler';
import { streamFor } from '../../../models/random/stream';
import { JOE_KUO_DIRECTIONS } from '../../../models/sensitivity/sobol-directions';
import { SOBOL_MAX_DIMENSIONS, sobolSequence } from '../../../models/sensitivity/sobol-sequence';

/** Multiply polynomials over GF(2) held as bit masks, reduced modulo `mod` of degree s. */
function mulMod(x: bigint, y: bigint, mod: bigint, s: number): bigint {
  let out = 0n;
  while (y > 0n) {
    if (y & 1n) out ^= x;
    y >>= 1n;
    x <<= 1n;
    if ((x >> BigInt(s)) & 1n) x ^= mod;
  }
  return out;
}

function powMod(base: bigint, e: bigint, mod: bigint, s: number): bigint {
  let out = 1n;
  while (e > 0n) {
    if (e & 1n) out = mulMod(out, base, mod, s);
    base = mulMod(base, base, mod, s);
    e >>= 1n;
  }
  return out;
}

function primeFactors(n: number): number[] {
  const out: number[] = [];
  for (let p = 2; p * p <= n; p++) {
    if (n % p === 0) out.push(p);
    while (n % p === 0) n /= p;
  }
  if (n > 1) out.push(n);
  return out;
}

function totient(n: number): number {
  return primeFactors(n).reduce((phi, p) => (phi / p) * (p - 1), n);
}

describe('Sobol sequence against published reference points', () => {
  it('matches the unscrambled 2-D points of scipy.stats.qmc.Sobol', () => {
    // scipy/stats/tests/test_qmc.py, TestSobol.unscramble_nd (Joe–Kuo direction numbers).
    expect(sobolSequence(8, 2)).toEqual([
      [0, 0],
      [0.5, 0.5],
      [0.75, 0.25],
      [0.25, 0.75],
      [0.375, 0.375],
      [0.875, 0.875],
      [0.625, 0.125],
      [0.125, 0.625],
    ]);
  });

  it('matches scipy\u2019s unscrambled 1-D and third-dimension reference columns', () => {
    // scipy/stats/tests/test_qmc.py, test_Unscrambled1DSobol and test_Unscrambled3DSobol.
    const points = sobolSequence(10, 3);
    expect(points.map((p) => p[0])).toEqual([0, 0.5, 0.75, 0.25, 0.375, 0.875, 0.625, 0.125, 0.1875, 0.6875]);
    expect(points.map((p) => p[2])).toEqual([0, 0.5, 0.25, 0.75, 0.625, 0.125, 0.875, 0.375, 0.9375, 0.4375]);
  });
});

describe('Joe & Kuo direction table as stored', () => {
  it('lists, degree by degree, exactly the φ(2^s − 1)/s primitive polynomials of degrees 1..9', () => {
    // A degree-s polynomial over GF(2) with non-zero constant term is primitive iff x has order
    // 2^s − 1 modulo it (Lidl & Niederreiter, Finite Fields, Theorem 3.16 — recalled from memory);
    // there are φ(2^s − 1)/s of them (same source). Joe & Kuo use one per dimension, by degree.
    const byDegree = new Map<number, Set<number>>();
    JOE_KUO_DIRECTIONS.forEach(([d, s, a], row) => {
      expect(d).toBe(row + 2);
      const order = 2 ** s - 1;
      const mod = (1n << BigInt(s)) | (BigInt(a) << 1n) | 1n;
      expect(powMod(2n, BigInt(order), mod, s)).toBe(1n);
      for (const q of primeFactors(order)) expect(powMod(2n, BigInt(order / q), mod, s)).not.toBe(1n);
      const set = byDegree.get(s) ?? new Set<number>();
      set.add(a);
      byDegree.set(s, set);
    });
    for (let s = 1; s <= 9; s++) expect(byDegree.get(s)?.size).toBe(totient(2 ** s - 1) / s);
    expect(JOE_KUO_DIRECTIONS).toHaveLength(100);
  });

  it('has odd initial direction integers m_k < 2^k (required of Sobol\u2019 direction numbers)', () => {
    // Bratley & Fox 1988, ACM TOMS 14:88–100: each m_k is odd and less than 2^k.
    for (const [, s, , m] of JOE_KUO_DIRECTIONS) {
      expect(m).toHaveLength(s);
      m.forEach((mk, k) => {
        expect(mk % 2).toBe(1);
        expect(mk).toBeLessThan(2 ** (k + 1));
      });
    }
  });
});

describe('Sobol sequence balance', () => {
  // A Sobol' sequence is a (t, s)-sequence in base 2 (Sobol' 1967); every one-dimensional
  // projection is a (0, 1)-sequence, so the first 2^m points put exactly one point in each
  // interval [j/2^m, (j+1)/2^m). Matoušek's linear scramble plus a digital shift preserves the
  // net property (Matoušek 1998, J. Complexity 14:527–556 — recalled from memory).
  const m = 7;
  const n = 2 ** m;
  function everyCellOnce(values: number[]): boolean {
    const cells = new Array(n).fill(0);
    for (const v of values) cells[Math.floor(v * n)]++;
    return cells.every((c) => c === 1);
  }

  it('stratifies every coordinate of all 101 dimensions, plain and scrambled', () => {
    for (const scramble of [undefined, new Sampler(streamFor(5, 1))]) {
      const points = sobolSequence(n, SOBOL_MAX_DIMENSIONS, scramble);
      for (let j = 0; j < SOBOL_MAX_DIMENSIONS; j++)
        expect(everyCellOnce(points.map((p) => p[j]))).toBe(true);
    }
  });

  it('makes the first two dimensions a (0, m, 2)-net: one point in every elementary box of area 2^-m', () => {
    // The first two Sobol' coordinates form a (0, 2)-sequence in base 2 (Sobol' 1967).
    for (const scramble of [undefined, new Sampler(streamFor(6, 1))]) {
      const points = sobolSequence(n, 2, scramble);
      for (let a = 0; a <= m; a++) {
        const rows = 2 ** a;
        const cols = 2 ** (m - a);
        const boxes = new Array(n).fill(0);
        for (const [x, y] of points) boxes[Math.floor(x * rows) * cols + Math.floor(y * cols)]++;
        expect(boxes.every((c) => c === 1)).toBe(true);
      }
    }
  });

  it('differs between scramble seeds and stays in [0, 1)', () => {
    const one = sobolSequence(64, 4, new Sampler(streamFor(1, 2)));
    const two = sobolSequence(64, 4, new Sampler(streamFor(2, 2)));
    expect(one).not.toEqual(two);
    expect(one).toEqual(sobolSequence(64, 4, new Sampler(streamFor(1, 2))));
    for (const p of [...one, ...two]) for (const x of p) expect(x >= 0 && x < 1).toBe(true);
  });

  it('refuses more dimensions than the table has', () => {
    expect(() => sobolSequence(4, SOBOL_MAX_DIMENSIONS + 1)).toThrow(RangeError);
  });
});
