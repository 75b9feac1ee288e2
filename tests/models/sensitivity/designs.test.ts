import { describe, expect, it } from 'vitest';
import type { SweepDesign, SweepParameter } from '../../../models/sensitivity/design';
import { pointSeed } from '../../../models/sensitivity/point-seed';
import { designPoints, designSize } from '../../../models/sensitivity/points';
import { designProblems } from '../../../models/sensitivity/validate';

const params: SweepParameter[] = [
  { path: 'profile.seedDecay', min: 0.1, max: 0.6, base: 0.3 },
  { path: 'field.initialSeedbank', min: 100, max: 5000, base: 1000 },
  { path: 'step.fall.efficacy', min: 0.5, max: 0.99, base: 0.9 },
];

describe('one-at-a-time design', () => {
  it('has 2k + 1 points: the shared base, then each parameter alone at min and at max', () => {
    // Tornado (one-at-a-time) analysis: each input swung over its range with the others at
    // their base values (Saltelli et al. 2008, The Primer — recalled from memory); the base
    // point is shared, hence 2k + 1 rather than 3k.
    const points = designPoints(params, { kind: 'one-at-a-time' }, 1);
    expect(points).toHaveLength(2 * params.length + 1);
    expect(designSize(params, { kind: 'one-at-a-time' })).toBe(points.length);
    expect(points[0]).toEqual([0.3, 1000, 0.9]);
    expect(points[1]).toEqual([0.1, 1000, 0.9]);
    expect(points[2]).toEqual([0.6, 1000, 0.9]);
    expect(points[5]).toEqual([0.3, 1000, 0.5]);
    expect(points[6]).toEqual([0.3, 1000, 0.99]);
  });
});

describe('full factorial design', () => {
  it('has levels^k points holding every combination of levels exactly once', () => {
    // Definition of a full factorial (Montgomery, Design and Analysis of Experiments): all L^k
    // combinations of the k factors' L levels.
    for (const levels of [2, 3, 5]) {
      const design: SweepDesign = { kind: 'factorial', levels };
      const points = designPoints(params, design, 1);
      expect(points).toHaveLength(levels ** params.length);
      expect(designSize(params, design)).toBe(levels ** params.length);
      expect(new Set(points.map((p) => p.join('|'))).size).toBe(points.length);
      params.forEach((p, j) => {
        const values = [...new Set(points.map((row) => row[j]))].sort((a, b) => a - b);
        expect(values).toHaveLength(levels);
        expect(values[0]).toBe(p.min);
        expect(values[levels - 1]).toBe(p.max);
        values.forEach((v, l) => expect(v).toBeCloseTo(p.min + ((p.max - p.min) * l) / (levels - 1), 12));
      });
    }
  });

  it('rounds the levels of a whole-number parameter and refuses more levels than whole values', () => {
    const years: SweepParameter[] = [{ path: 'field.years', min: 1, max: 4, base: 2, integer: true }];
    expect(designPoints(years, { kind: 'factorial', levels: 3 }, 1)).toEqual([[1], [3], [4]]);
    expect(designProblems(years, { kind: 'factorial', levels: 5 })).toEqual([
      'parameter "field.years" has only 4 whole values, fewer than 5 levels',
    ]);
  });
});

describe('design sizes', () => {
  it('are N·(k + 2) for Sobol\u2019 (Saltelli 2010: A, B and k matrices A_B^(i)) and n for a Latin hypercube', () => {
    // Saltelli et al. 2010, Comput. Phys. Commun. 181:259–270: N(k + 2) model runs for first-order
    // and total indices together.
    const sobol: SweepDesign = { kind: 'sobol', baseSamples: 16 };
    expect(designSize(params, sobol)).toBe(16 * 5);
    expect(designPoints(params, sobol, 1)).toHaveLength(16 * 5);
    expect(designPoints(params, { kind: 'latin-hypercube', points: 37 }, 1)).toHaveLength(37);
  });

  it('lay each Sobol\u2019 block out as A, B, then A with column i from B', () => {
    const points = designPoints(params, { kind: 'sobol', baseSamples: 8 }, 4);
    for (let r = 0; r < 8; r++) {
      const [a, b, ...ab] = points.slice(r * 5, r * 5 + 5);
      ab.forEach((row, i) => expect(row).toEqual(a.map((x, j) => (j === i ? b[j] : x))));
      // A and B are different coordinates of the sequence, never the same point.
      expect(a).not.toEqual(b);
    }
  });
});

describe('determinism', () => {
  const random: SweepDesign[] = [
    { kind: 'latin-hypercube', points: 50 },
    { kind: 'sobol', baseSamples: 32 },
  ];

  it('repeats a design exactly for the same seed and changes it for another', () => {
    for (const design of random) {
      expect(designPoints(params, design, 2024)).toEqual(designPoints(params, design, 2024));
      expect(designPoints(params, design, 2024)).not.toEqual(designPoints(params, design, 2025));
    }
  });

  it('derives point seeds from the sweep seed and point index alone', () => {
    const seeds = Array.from({ length: 2000 }, (_, i) => pointSeed(77, i));
    expect(seeds).toEqual(Array.from({ length: 2000 }, (_, i) => pointSeed(77, i)));
    expect(new Set(seeds).size).toBe(seeds.length);
    expect(seeds.every(Number.isSafeInteger)).toBe(true);
    expect(pointSeed(78, 0)).not.toBe(pointSeed(77, 0));
    expect(() => pointSeed(77, -1)).toThrow(RangeError);
  });
});

describe('designProblems', () => {
  it('names each problem of a bad definition, and designPoints refuses it', () => {
    const bad: SweepParameter[] = [
      { path: 'a', min: 2, max: 1, base: 1.5 },
      { path: 'a', min: 0, max: 1, base: 3 },
      { path: 'n', min: 0.5, max: 4, base: 1, integer: true },
    ];
    expect(designProblems(bad, { kind: 'latin-hypercube', points: 0 })).toEqual([
      'parameter "a": min (2) must be less than max (1)',
      'parameter "a": base (1.5) must lie within [2, 1]',
      'parameter "a" is listed twice',
      'parameter "a": base (3) must lie within [0, 1]',
      'parameter "n" is a whole number: min, max and base must be integers',
      'latin hypercube points must be a positive integer, got 0',
    ]);
    expect(designProblems([], { kind: 'one-at-a-time' })).toEqual([
      'a sweep must vary at least one parameter',
    ]);
    expect(designProblems(params, { kind: 'factorial', levels: 1 })).toHaveLength(1);
    expect(designProblems(params, { kind: 'sobol', baseSamples: 1 })).toHaveLength(1);
    const many = Array.from({ length: 51 }, (_, i) => ({ path: `p${i}`, min: 0, max: 1, base: 0 }));
    expect(designProblems(many, { kind: 'sobol', baseSamples: 8 })).toEqual([
      'a sobol design varies at most 50 parameters, got 51',
    ]);
    expect(designProblems(params, { kind: 'sobol', baseSamples: 8 })).toEqual([]);
    expect(() => designPoints(bad, { kind: 'one-at-a-time' }, 1)).toThrow(
      /invalid sweep: parameter "a": min/,
    );
  });
});
