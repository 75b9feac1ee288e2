// A sweep point is a projection with some inputs changed: its outcomes must read exactly as the
// projection summary of the same scenario and seed reads them, and the parameter list must
// expose the example file's own values at the paths the scenario schema names.
import { median } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { runReplicates } from '../../../models/projection/replicates';
import { summarise } from '../../../models/projection/summarise';
import { pointSeed } from '../../../models/sensitivity/point-seed';
import { yearsUntilDecline } from '../../../models/summary/decline';
import { evaluatePoint } from '../../../shared/sweeps/evaluate';
import { pointOutcomes } from '../../../shared/sweeps/outcomes';
import { sweepableParameters } from '../../../shared/sweeps/parameters';
import { valueAt, withValues } from '../../../shared/sweeps/paths';
import { planSweep } from '../../../shared/sweeps/plan';
import { exampleJson, scenarioFrom } from '../../models/projection/fixtures';

describe('parameter paths', () => {
  it('set values where the scenario schema’s paths point, leaving the original alone', () => {
    const base = scenarioFrom('demo-perennial-dock');
    const changed = withValues(
      base,
      ['profile.seedDecay.deep', 'strategy.steps[2].efficacy.mean'],
      [0.07, 0.5],
    );
    expect(changed.profile.seedDecay.deep).toBe(0.07);
    expect((changed.strategy.steps[2].efficacy as { mean: number }).mean).toBe(0.5);
    // The example file holds 0.04 and 0.85 there (models/examples/demo-perennial-dock.json).
    expect(base.profile.seedDecay.deep).toBe(0.04);
    expect(valueAt(base, 'strategy.steps[2].efficacy.mean')).toBe(0.85);
    expect(() => withValues(base, ['strategy.steps[0].label'], [1])).toThrow(/not a number/);
  });

  it('list each step’s and each age class’s numbers with the example’s values, never a label rate', () => {
    const json = exampleJson('demo-perennial-dock');
    const list = sweepableParameters(scenarioFrom('demo-perennial-dock'));
    const byPath = new Map(list.map((p) => [p.path, p]));
    json.profile.germination.shallowByAge.forEach((g: number, i: number) =>
      expect(byPath.get(`profile.germination.shallowByAge[${i}]`)?.base).toBe(g),
    );
    json.strategy.steps.forEach((step: { cost: { application: number }; label: string }, i: number) => {
      const p = byPath.get(`strategy.steps[${i}].cost.application`)!;
      expect(p.base).toBe(step.cost.application);
      expect(p.label).toContain(step.label);
    });
    expect(byPath.get('field.initialSeedbank.shallow')).toMatchObject({ base: 1500, unit: 'seeds/m²' });
    expect(list.some((p) => p.path.includes('chemical'))).toBe(false);
    expect(list.some((p) => p.path === 'horizonYears' || p.path === 'seed')).toBe(false);
  });
});

describe('point outcomes', () => {
  it('equal the projection summary of the same scenario and seed', () => {
    const scenario = scenarioFrom('demo-perennial-dock', (j) => {
      j.replicates = 101;
      j.horizonYears = 12;
    });
    const block = runReplicates(scenario, 0, scenario.replicates);
    const summary = summarise(scenario, block);
    const T = 7;
    const got = pointOutcomes(scenario, block, ['seedbank', 'plants', 'depletion', 'decline90', 'npv'], T);
    expect(got.seedbank).toBeCloseTo(summary.series.seedbankTotal.mean[T], 9);
    expect(got.plants).toBeCloseTo(summary.series.established.mean[T], 9);
    expect(got.depletion).toBe(summary.depletionProbability[T]);
    expect(got.npv).toBeCloseTo(summary.economics.npvPerHa.mean, 6);
    // Years to 90 % decline: the median over replicates (simple-statistics' median as the
    // reference), a replicate that never declines counting as horizon + 1.
    const years = Array.from({ length: 101 }, (_, r) => {
      const row = block.series.seedbankTotal.subarray(r * 13, (r + 1) * 13);
      return yearsUntilDecline(row, 0.9) ?? 13;
    });
    expect(got.decline90).toBe(median(years));
  });

  it('come from the point’s own seed, and a point the schema refuses records why', () => {
    const base = scenarioFrom('lesson-seedbank-decay');
    const run = {
      base,
      paths: ['profile.seedDecay.shallow'],
      outcomes: ['seedbank'] as const,
      outcomeYear: 3,
      replicatesPerPoint: 30,
      seed: 5,
    };
    const point = evaluatePoint({ ...run, outcomes: ['seedbank'] }, 4, [0.2]);
    const scenario = {
      ...withValues(base, ['profile.seedDecay.shallow'], [0.2]),
      replicates: 30,
      seed: pointSeed(5, 4),
    };
    const block = runReplicates(scenario, 0, 30);
    if (!point.ok) throw new Error(point.error);
    expect(point.outcomes.seedbank).toBeCloseTo(summarise(scenario, block).series.seedbankTotal.mean[3], 9);
    const bad = evaluatePoint({ ...run, outcomes: ['seedbank'] }, 0, [1.5]);
    expect(bad).toEqual({
      ok: false,
      error: 'profile.seedDecay.shallow: 1.5 is outside 0–1 (fraction per year)',
    });
  });
});

describe('planning a sweep', () => {
  it('sizes a factorial grid as levels^k and refuses a one-at-a-time range without the base', () => {
    const base = scenarioFrom('demo-perennial-dock');
    const spec = {
      parameters: [
        { path: 'profile.seedDecay.shallow', min: 0.05, max: 0.3 },
        { path: 'profile.ageClasses', min: 2, max: 6 },
      ],
      design: { kind: 'factorial' as const, levels: 3 },
      outcomes: ['seedbank' as const],
      outcomeYear: 10,
      replicatesPerPoint: 10,
      seed: 1,
    };
    const planned = planSweep(base, spec);
    if (!planned.ok) throw new Error(JSON.stringify(planned.problems));
    // A full factorial of L levels in k factors has L^k runs (Montgomery, Design and Analysis of Experiments).
    expect(planned.plan.points).toBe(3 ** 2);
    expect(planned.plan.replicateYears).toBe(9 * 10 * 20);
    expect(planned.plan.parameters[1].integer).toBe(true);
    const oat = planSweep(base, {
      ...spec,
      design: { kind: 'one-at-a-time' },
      parameters: [{ path: 'profile.seedDecay.shallow', min: 0.2, max: 0.3 }],
    });
    expect(oat.ok).toBe(false);
    if (!oat.ok) expect(oat.problems['parameters[0].min']).toMatch(/value 0\.12 lies outside 0\.2–0\.3/);
  });
});
