// With no plants, a seedbank is a cohort of seeds that each survive a year independently
// with q = (1 − g)(1 − d): emergence removes a fraction g (emerged seeds leave the bank
// whether or not they survive), decay a fraction d. Textbook geometric decay:
// E[S_t] = S0·q^t, half-life ln 2 / −ln q, and exactly S_t ~ Binomial(S0, q^t) for whole
// seeds (independent survival of each seed over t years).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import quantile from '@stdlib/stats-base-dists-chisquare-quantile';
import { projectMeanField } from '../../../models/projection/mean-field';
import { runReplicates } from '../../../models/projection/replicates';
import { at, scenarioFrom } from '../projection/fixtures';

const noPlants = (
  g: number,
  d: number,
  gDeep: number,
  dDeep: number,
  ageClasses: number,
  s0: number,
  deep0: number,
) =>
  scenarioFrom('lesson-seedbank-decay', (s) => {
    s.profile.ageClasses = ageClasses;
    s.profile.germination = { shallowByAge: [g], deep: gDeep };
    s.profile.seedDecay = { shallow: d, deep: dDeep };
    s.field.initialSeedbank = { shallow: s0, deep: deep0 };
    s.horizonYears = 30;
  });

describe('seedbank without plants (geometric decay)', () => {
  it('mean field follows S0·((1−g)(1−d))^t in each layer', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.9, noNaN: true }),
        fc.double({ min: 0, max: 0.9, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.integer({ min: 1, max: 6 }),
        fc.integer({ min: 1, max: 100_000 }),
        fc.integer({ min: 0, max: 100_000 }),
        (g, d, gDeep, dDeep, A, s0, deep0) => {
          const run = projectMeanField(noPlants(g, d, gDeep, dDeep, A, s0, deep0));
          const q = (1 - g) * (1 - d);
          const qDeep = (1 - gDeep) * (1 - dDeep);
          for (let t = 0; t <= 30; t++) {
            expect(run.series.seedbankShallow[t]).toBeCloseTo(s0 * q ** t, 9 - Math.ceil(Math.log10(s0 + 1)));
            expect(run.series.seedbankDeep[t]).toBeCloseTo(
              deep0 * qDeep ** t,
              9 - Math.ceil(Math.log10(deep0 + 1)),
            );
          }
        },
      ),
      { seed: 11, numRuns: 80 },
    );
  });

  it('halves in ln 2 / −ln((1−g)(1−d)) years', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 0.5, noNaN: true }),
        fc.double({ min: 0.01, max: 0.5, noNaN: true }),
        (g, d) => {
          const s0 = 1000;
          const run = projectMeanField(noPlants(g, d, 0, 0, 1, s0, 0));
          const halfLife = Math.log(2) / -Math.log((1 - g) * (1 - d));
          const before = Math.floor(halfLife);
          const after = Math.ceil(halfLife);
          fc.pre(after <= 30);
          expect(run.series.seedbankTotal[before]).toBeGreaterThanOrEqual(s0 / 2 - 1e-9);
          expect(run.series.seedbankTotal[after]).toBeLessThanOrEqual(s0 / 2 + 1e-9);
        },
      ),
      { seed: 12, numRuns: 60 },
    );
  });

  it('stochastic replicates have the Binomial(S0, q^t) mean and variance', () => {
    const g = 0.1;
    const d = 0.2;
    const s0 = 1000; // seeds/m², 100 m² in the lesson field: 100,000 seeds
    const scenario = noPlants(g, d, 0, 0, 3, s0, 0);
    const R = 400;
    const block = runReplicates(scenario, 0, R);
    const area = scenario.field.areaHa * 10_000;
    const n = s0 * area;
    const q = (1 - g) * (1 - d);
    for (let t = 1; t <= 30; t++) {
      const counts = Array.from({ length: R }, (_, r) => at(block.series.seedbankTotal, 30, r, t) * area);
      const p = q ** t;
      const mean = counts.reduce((a, b) => a + b, 0) / R;
      const variance = counts.reduce((a, b) => a + (b - mean) ** 2, 0) / (R - 1);
      const sigma2 = n * p * (1 - p);
      expect(Math.abs(mean - n * p)).toBeLessThan(5 * Math.sqrt(sigma2 / R));
      // (R − 1)s²/σ² is close to chi-square with R − 1 d.f. for near-normal counts; 1e-6 tails.
      const ratio = ((R - 1) * variance) / sigma2;
      expect(ratio).toBeGreaterThan(quantile(1e-6, R - 1));
      expect(ratio).toBeLessThan(quantile(1 - 1e-6, R - 1));
    }
  });
});
