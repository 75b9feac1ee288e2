import * as formulajs from '@formulajs/formulajs';
import { inv } from 'mathjs';
import { sampleRankCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { Sampler } from '../../../models/random/sampler';
import { streamFor } from '../../../models/random/stream';
import type { SweepParameter } from '../../../models/sensitivity/design';
import { designPoints } from '../../../models/sensitivity/points';
import { prcc, spearman } from '../../../models/sensitivity/prcc';

const params: SweepParameter[] = [
  { path: 'x1', min: 0, max: 1, base: 0.5 },
  { path: 'x2', min: 0, max: 2, base: 1 },
  { path: 'x3', min: 0, max: 4, base: 2 },
  { path: 'x4', min: 0, max: 1, base: 0.5 },
];

/** Midranks written out independently of the engine, for the matrix cross-check. */
function ranksOf(values: number[]): number[] {
  return values.map((v) => {
    const below = values.filter((w) => w < v).length;
    const equal = values.filter((w) => w === v).length;
    return below + (equal + 1) / 2;
  });
}

describe('PRCC on a model with known monotone structure', () => {
  // y = 10·x1 + 3·exp(x2) − 0.5·x3 + small noise; x4 does not enter. Each input's effect is
  // monotone, so PRCC (Marino et al. 2008, J. Theor. Biol. 254:178–196) must be positive for x1
  // and x2, negative for x3, and not significant for x4. Their order follows the variance each
  // term contributes (closed form, independent uniform inputs): Var(10·x1) = 100/12 ≈ 8.3,
  // Var(3·e^x2) = 9·((e⁴ − 1)/4 − ((e² − 1)/2)²) ≈ 28.8, Var(0.5·x3) = 0.25·16/12 ≈ 0.33, so
  // |PRCC x2| > |PRCC x1| > |PRCC x3| > |PRCC x4|.
  const n = 500;
  const points = designPoints(params, { kind: 'latin-hypercube', points: n }, 11);
  const noise = new Sampler(streamFor(11, 99));
  const outcomes = points.map(
    ([x1, x2, x3]) => 10 * x1 + 3 * Math.exp(x2) - 0.5 * x3 + 0.01 * noise.normal(),
  );
  const result = prcc(params, points, outcomes);

  it('signs and order of the coefficients follow the model; irrelevant x4 is not significant', () => {
    const [r1, r2, r3, r4] = result;
    expect(result.map((r) => r.path)).toEqual(['x1', 'x2', 'x3', 'x4']);
    expect(r1.coefficient).toBeGreaterThan(0.9);
    expect(r2.coefficient).toBeGreaterThan(r1.coefficient);
    expect(r3.coefficient).toBeLessThan(-0.2);
    expect(Math.abs(r3.coefficient)).toBeLessThan(r1.coefficient);
    expect(Math.abs(r4.coefficient)).toBeLessThan(Math.abs(r3.coefficient));
    for (const r of [r1, r2, r3]) expect(r.pValue).toBeLessThan(1e-6);
    // Not significant at the 1 % level: x4's p-value is uniform under the null, so a 5 % level
    // would be crossed by one design seed in twenty.
    expect(r4.pValue).toBeGreaterThan(0.01);
  });

  it('equals the partial correlation from the inverse rank correlation matrix (mathjs inv)', () => {
    // With P = R⁻¹ for the correlation matrix R of (ranked x1..x4, ranked y), the partial
    // correlation of x_j and y given the rest is −P_jy / √(P_jj·P_yy) (Whittaker 1990,
    // Graphical Models in Applied Multivariate Statistics — recalled from memory).
    const columns = [...params.map((_, j) => ranksOf(points.map((p) => p[j]))), ranksOf(outcomes)];
    const corr = (a: number[], b: number[]) => formulajs.CORREL(a, b) as number;
    const R = columns.map((a) => columns.map((b) => corr(a, b)));
    const P = inv(R) as number[][];
    const y = columns.length - 1;
    result.forEach((r, j) => {
      expect(r.coefficient).toBeCloseTo(-P[j][y] / Math.sqrt(P[j][j] * P[y][y]), 10);
    });
  });

  it('p-values follow Student t with N − 2 − (k − 1) degrees of freedom (formulajs T.DIST.RT)', () => {
    // Marino et al. 2008: t = r·√((N − 2 − p)/(1 − r²)) on N − 2 − p degrees of freedom, p the
    // number of parameters discounted (k − 1). Two-sided p = 2 × the upper tail from @formulajs's T.DIST.RT.
    for (const r of result) {
      const df = n - 2 - (params.length - 1);
      expect(r.degreesOfFreedom).toBe(df);
      const t = r.coefficient * Math.sqrt(df / (1 - r.coefficient ** 2));
      expect(r.t).toBeCloseTo(t, 8);
      if (r.pValue > 1e-12) {
        const reference = 2 * (formulajs.T.DIST.RT(Math.abs(t), df) as number);
        expect(Math.abs(r.pValue - reference) / reference).toBeLessThan(1e-6);
      }
    }
  });
});

describe('PRCC edge cases', () => {
  it('with one parameter equals Spearman, and its p-value the usual t-test of r on N − 2 df', () => {
    // Nothing is regressed out, so PRCC is the rank correlation itself (Marino et al. 2008).
    const one = [params[0]];
    const x = [0.1, 0.5, 0.3, 0.9, 0.7, 0.2, 0.8, 0.4];
    const y = [1, 3, 2, 8, 4, 1.5, 9, 2.5];
    const [r] = prcc(
      one,
      x.map((v) => [v]),
      y,
    );
    expect(r.coefficient).toBeCloseTo(sampleRankCorrelation(x, y), 12);
    expect(r.degreesOfFreedom).toBe(x.length - 2);
    const t = r.coefficient * Math.sqrt((x.length - 2) / (1 - r.coefficient ** 2));
    expect(r.pValue).toBeCloseTo(2 * (formulajs.T.DIST.RT(Math.abs(t), x.length - 2) as number), 8);
  });

  it('is NaN for a constant outcome, and needs k + 2 points', () => {
    const rows = [
      [0, 1],
      [1, 0],
      [2, 2],
      [3, 1],
    ];
    const two = params.slice(0, 2);
    const result = prcc(two, rows, [5, 5, 5, 5]);
    expect(result[0].coefficient).toBeNaN();
    expect(result[0].pValue).toBeNaN();
    expect(() => prcc(two, rows.slice(0, 3), [1, 2, 3])).toThrow(/at least 4 points/);
    expect(() => prcc(two, rows, [1, 2, 3])).toThrow(RangeError);
    expect(() => prcc(two, rows, [1, 2, NaN, 3])).toThrow(/point 2/);
  });
});

describe('spearman', () => {
  it('agrees with simple-statistics sampleRankCorrelation (midranks for ties) on random data', () => {
    // simple-statistics 7.12 gives tied values the mean of their ranks, as Spearman's rho is
    // defined (Kendall & Gibbons, Rank Correlation Methods), the same convention as ours.
    const sampler = new Sampler(streamFor(3, 1));
    for (let trial = 0; trial < 50; trial++) {
      const n = 3 + Math.floor(sampler.uniform() * 60);
      // Every other trial rounds to few values, so ties are common.
      const levels = trial % 2 === 0 ? 0 : 2 + Math.floor(sampler.uniform() * 4);
      const draw = () => (levels ? Math.floor(sampler.uniform() * levels) : sampler.normal());
      const x = Array.from({ length: n }, draw);
      const y = x.map((v) => v + (levels ? draw() : sampler.normal()));
      const reference = sampleRankCorrelation(x, y);
      if (Number.isNaN(reference)) expect(spearman(x, y)).toBeNaN();
      else expect(spearman(x, y)).toBeCloseTo(reference, 12);
    }
  });

  it('is ±1 for any strictly monotone relation and NaN when one side is constant', () => {
    // Definition: Spearman's rho is 1 when the ranks agree exactly (Spearman 1904).
    const x = [3, 1, 4, 1.5, 9, 2.6];
    expect(
      spearman(
        x,
        x.map((v) => Math.exp(v)),
      ),
    ).toBeCloseTo(1, 15);
    expect(
      spearman(
        x,
        x.map((v) => -(v ** 3)),
      ),
    ).toBeCloseTo(-1, 15);
    expect(
      spearman(
        x,
        x.map(() => 2),
      ),
    ).toBeNaN();
  });
});
