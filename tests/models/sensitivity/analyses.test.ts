import { describe, expect, it } from 'vitest';
import type { SweepParameter } from '../../../models/sensitivity/design';
import { mainEffects } from '../../../models/sensitivity/factorial';
import { designPoints } from '../../../models/sensitivity/points';
import { tornado } from '../../../models/sensitivity/tornado';

const params: SweepParameter[] = [
  { path: 'a', min: 0, max: 2, base: 1 },
  { path: 'b', min: 10, max: 20, base: 12 },
  { path: 'c', min: -1, max: 1, base: 0 },
];

describe('tornado', () => {
  it('gives swing |c_j|·(max_j − min_j) for a linear outcome, longest bar first', () => {
    // For y = Σ c_j·x_j, moving x_j alone from min to max changes y by c_j·(max_j − min_j)
    // (closed form). Here 3·2 = 6, 0.1·10 = 1, −5·2 = −10 in swing order c, a, b.
    const c = [3, 0.1, -5];
    const f = (x: number[]) => x.reduce((s, xi, j) => s + c[j] * xi, 0);
    const points = designPoints(params, { kind: 'one-at-a-time' }, 1);
    const result = tornado(params, points.map(f));
    expect(result.baseOutcome).toBeCloseTo(3 * 1 + 0.1 * 12, 12);
    expect(result.bars.map((b) => b.path)).toEqual(['c', 'a', 'b']);
    expect(result.bars.map((b) => b.swing)).toEqual([10, 6, 1].map((x) => expect.closeTo(x, 12)));
    const barC = result.bars[0];
    expect([barC.low, barC.high]).toEqual([-1, 1]);
    expect(barC.outcomeAtLow - barC.outcomeAtHigh).toBeCloseTo(10, 12);
  });

  it('keeps parameter order for equal swings and checks its inputs', () => {
    const result = tornado(params, [0, 1, 2, 1, 2, 2, 1]);
    expect(result.bars.map((b) => b.path)).toEqual(['a', 'b', 'c']);
    expect(() => tornado(params, [0, 1, 2])).toThrow(/needs 7 outcomes, got 3/);
    expect(() => tornado(params, [0, 1, 2, 1, Infinity, 2, 1])).toThrow(/point 4/);
  });
});

describe('factorial main effects', () => {
  it('equal g_j(level) + Σ_{i≠j} mean over levels of g_i for an additive outcome', () => {
    // For y = Σ g_i(x_i) on a balanced full grid, the mean at a level of x_j averages every
    // combination of the other factors, so it is g_j(level) plus the others' level means
    // (closed form; the additive model of a factorial without interactions, Montgomery,
    // Design and Analysis of Experiments).
    const g = [(x: number) => x * x, (x: number) => Math.sqrt(x), (x: number) => 4 * x];
    const levels = 3;
    const points = designPoints(params, { kind: 'factorial', levels }, 1);
    const outcomes = points.map((x) => x.reduce((s, xi, j) => s + g[j](xi), 0));
    const effects = mainEffects(params, levels, outcomes);
    const levelValues = params.map((p) => [0, 1, 2].map((l) => p.min + ((p.max - p.min) * l) / 2));
    const levelMean = (i: number) => levelValues[i].reduce((s, v) => s + g[i](v), 0) / levels;
    effects.forEach((effect, j) => {
      expect(effect.path).toBe(params[j].path);
      expect(effect.levels).toEqual(levelValues[j].map((v) => expect.closeTo(v, 12)));
      const others = [0, 1, 2].filter((i) => i !== j).reduce((s, i) => s + levelMean(i), 0);
      effect.means.forEach((m, l) => expect(m).toBeCloseTo(g[j](levelValues[j][l]) + others, 10));
      expect(effect.range).toBeCloseTo(Math.max(...effect.means) - Math.min(...effect.means), 12);
    });
    expect(() => mainEffects(params, levels, outcomes.slice(1))).toThrow(/needs 27 outcomes/);
  });
});
