import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Sampler } from '../../../models/random/sampler';
import { streamFor } from '../../../models/random/stream';
import type { SweepParameter } from '../../../models/sensitivity/design';
import { latinHypercubeUnits } from '../../../models/sensitivity/latin-hypercube';
import { designPoints } from '../../../models/sensitivity/points';

// McKay, Beckman & Conover (1979, Technometrics 21:239–245): a Latin hypercube sample of size n
// divides each input's range into n equal-probability strata and takes exactly one value from
// each, for every input.

/**
 * The s with s/n ≤ u < (s+1)/n, the edges computed as written; ⌊u·n⌋ can be one off either way
 * by rounding, so its neighbours are tried too. −1 when u lies in no stratum of [0, 1).
 */
function stratumOf(u: number, n: number): number {
  const guess = Math.floor(u * n);
  for (const s of [guess - 1, guess, guess + 1])
    if (s >= 0 && s < n && u >= s / n && u < (s + 1) / n) return s;
  return -1;
}

describe('Latin hypercube stratification', () => {
  it('puts exactly one unit coordinate in each stratum [s/n, (s+1)/n), for every column', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 300 }),
        fc.integer({ min: 1, max: 8 }),
        fc.integer(),
        (n, k, seed) => {
          const rows = latinHypercubeUnits(n, k, new Sampler(streamFor(seed, 1)));
          expect(rows).toHaveLength(n);
          for (let j = 0; j < k; j++) {
            const hits = new Array(n).fill(0);
            for (const row of rows) hits[stratumOf(row[j], n)]++;
            expect(hits.every((h) => h === 1)).toBe(true);
          }
        },
      ),
      { seed: 424242, numRuns: 150 },
    );
  });

  it('stratifies each parameter\u2019s own range: the i-th smallest value lies in the i-th stratum of [min, max]', () => {
    const parameter = fc
      .tuple(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: 1e-3, max: 1e6, noNaN: true }))
      .map(([min, width]): SweepParameter => ({ path: '', min, max: min + width, base: min }));
    fc.assert(
      fc.property(
        fc.array(parameter, { minLength: 1, maxLength: 6 }),
        fc.integer({ min: 1, max: 200 }),
        fc.integer(),
        (drawn, n, seed) => {
          const params = drawn.map((p, i) => ({ ...p, path: `p${i}` }));
          const points = designPoints(params, { kind: 'latin-hypercube', points: n }, seed);
          expect(points).toHaveLength(n);
          params.forEach((p, j) => {
            const sorted = points.map((row) => row[j]).sort((a, b) => a - b);
            sorted.forEach((x, i) => {
              expect(x).toBeGreaterThanOrEqual(p.min + (p.max - p.min) * (i / n));
              expect(x).toBeLessThanOrEqual(p.min + (p.max - p.min) * ((i + 1) / n));
            });
          });
        },
      ),
      { seed: 515151, numRuns: 100 },
    );
  });

  it('gives each whole value of an integer parameter the same count when n is a multiple of their number', () => {
    // Follows from the strata: with n = c·m points and m whole values, each value's share
    // [v/m, (v+1)/m) of the unit range holds exactly c strata.
    const params: SweepParameter[] = [
      { path: 'year', min: 1, max: 5, base: 3, integer: true },
      { path: 'count', min: -2, max: 1, base: 0, integer: true },
    ];
    const points = designPoints(params, { kind: 'latin-hypercube', points: 60 }, 8);
    params.forEach((p, j) => {
      const counts = new Map<number, number>();
      for (const row of points) counts.set(row[j], (counts.get(row[j]) ?? 0) + 1);
      const values = p.max - p.min + 1;
      expect([...counts.keys()].sort((a, b) => a - b)).toEqual(
        Array.from({ length: values }, (_, v) => p.min + v),
      );
      for (const c of counts.values()) expect(c).toBe(60 / values);
    });
  });
});
