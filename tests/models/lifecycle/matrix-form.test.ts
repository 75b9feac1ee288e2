// The linearised annual map as a projection matrix. Strong ergodic theorem (Caswell 2001,
// Matrix Population Models, 2nd ed., §4.5): for a primitive matrix the population grows
// asymptotically by λ (the dominant eigenvalue) per year, whatever the start; and
// elasticities e_ij = a_ij s_ij / λ sum to 1 (Caswell 2001, §9.2; de Kroon et al. 1986,
// Ecology 67: 1427–1431).
import { describe, expect, it } from 'vitest';
import { analyzeLinearisedCycle, linearisedCycle } from '../../../models/lifecycle/matrix-form';
import { projectMeanField } from '../../../models/projection/mean-field';
import { withoutDensityDependence } from '../../../models/lifecycle/matrix-form';
import { scenarioFrom } from '../projection/fixtures';

/** A steady program: the given steps every year, on a 1 m² field so long runs stay in range. */
const steady = (
  name: 'demo-perennial-dock' | 'annual-goosefoot',
  keep: (kind: string) => boolean,
  years: number,
) =>
  scenarioFrom(name, (s) => {
    s.strategy.steps = s.strategy.steps.filter((step: { kind: string }) => keep(step.kind));
    for (const step of s.strategy.steps) step.schedule = { kind: 'every-year' };
    s.field.areaHa = 0.0001;
    s.horizonYears = years;
  });

describe('matrix form of the annual cycle', () => {
  const cases = [
    {
      name: 'perennial dock, seed-head cutting and fall spot treatment',
      scenario: steady('demo-perennial-dock', (k) => k !== 'hand-removal-with-crown', 150),
    },
    { name: 'perennial dock, the full program', scenario: steady('demo-perennial-dock', () => true, 150) },
    { name: 'annual, pre-emergence and cultivation', scenario: steady('annual-goosefoot', () => true, 30) },
  ];

  for (const { name, scenario } of cases) {
    it(`λ equals the mean-field growth rate: ${name}`, () => {
      const { analysis } = analyzeLinearisedCycle(scenario);
      const H = scenario.horizonYears;
      const run = projectMeanField(withoutDensityDependence(scenario));
      const total = (t: number) => run.series.seedbankTotal[t];
      expect(total(H) / total(H - 1)).toBeCloseTo(analysis.lambda, 6);
      const sum = analysis.elasticities.flat().reduce((a, b) => a + b, 0);
      expect(sum).toBeCloseTo(1, 10);
      expect(analysis.stableStage.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 10);
    });
  }

  it('names every stage: seedbank layer and age class, then established plants', () => {
    const scenario = steady('annual-goosefoot', () => true, 10);
    const { stages, matrix } = linearisedCycle(scenario);
    expect(stages).toEqual([
      'seedbank shallow, age 0',
      'seedbank shallow, age 1',
      'seedbank shallow, age 2+',
      'seedbank deep, age 0',
      'seedbank deep, age 1',
      'seedbank deep, age 2+',
      'established plants',
    ]);
    expect(matrix).toHaveLength(7);
    // An annual leaves no plants over winter (model brief): the plants row is all zero.
    expect(matrix[6].every((x) => x === 0)).toBe(true);
  });

  it('gives the pure seedbank (no plants) a dominant eigenvalue of (1 − g)(1 − d)', () => {
    // Geometric decay of a seed cohort (textbook): the only loop is the seed's own survival.
    // Deep seed (g_deep = 0) decays at d_deep = 0.5 here, so the shallow loop dominates.
    const scenario = scenarioFrom('lesson-seedbank-decay', (s) => {
      s.profile.seedDecay = { shallow: 0.2, deep: 0.5 };
    });
    const { analysis } = analyzeLinearisedCycle(scenario);
    expect(analysis.lambda).toBeCloseTo((1 - 0.1) * (1 - 0.2), 12);
  });
});
