// In the linear regime (no crowding, no environmental noise, efficacy drawn per
// application) every stage of the stochastic model is a sum of independent binomial and
// Poisson thinnings whose expectations are linear in the previous state, so the mean of
// the replicates is the deterministic mean-field projection (linearity of expectation for
// multi-type branching processes; Harris 1963, The Theory of Branching Processes, ch. 2
// — reference recalled from memory). Checked over random valid parameter sets, tolerance
// 5 standard errors of the replicate mean.
import { describe, it } from 'vitest';
import fc from 'fast-check';
import { projectMeanField } from '../../../models/projection/mean-field';
import { runReplicates } from '../../../models/projection/replicates';
import { seriesNames } from '../../../models/projection/trajectories';
import { scenarioFrom } from './fixtures';

const frac = (max = 1) => fc.double({ min: 0, max, noNaN: true });
const efficacyWithSpread = fc.oneof(
  fc.constant({ mean: 0.8, sd: 0 }),
  fc.constant({ mean: 0.6, sd: 0.2 }),
  fc.constant({ min: 0.3, mode: 0.7, max: 0.9 }),
);
const schedule = fc.oneof(
  fc.constant({ kind: 'every-year' }),
  fc.constant({ kind: 'every-k-years', k: 2, start: 1 }),
  fc.constant({ kind: 'year-range', first: 2, last: 4 }),
);
const cost = { material: 10, application: 5 };

const removalStep = fc.record({
  kind: fc.constantFrom(
    'post-emergence-herbicide',
    'spot-treatment',
    'hand-removal-with-crown',
    'hand-removal-leaving-crown',
    'cultivation',
  ),
  timing: fc.constantFrom('spring', 'summer', 'fall'),
  efficacy: efficacyWithSpread,
  schedule,
  topKill: frac(),
  burial: frac(0.5),
  exhumation: frac(0.5),
  fragmentsPerPlant: fc.double({ min: 0, max: 5, noNaN: true }),
});

type Removal = typeof removalStep extends fc.Arbitrary<infer T> ? T : never;

/** Builds a valid step of the chosen kind from generated numbers. */
function toStep(x: Removal, i: number): Record<string, unknown> {
  const base = {
    label: `step ${i}`,
    kind: x.kind,
    timing: x.timing,
    schedule: x.schedule,
    efficacy: x.efficacy,
    cost,
  };
  const targets = x.timing === 'spring' ? ['seedlings', 'rosettes'] : ['seedlings', 'rosettes', 'flowering'];
  switch (x.kind) {
    case 'post-emergence-herbicide':
    case 'spot-treatment':
      return { ...base, targets, topKill: x.topKill };
    case 'cultivation':
      return {
        ...base,
        targets,
        burial: x.burial,
        exhumation: x.exhumation,
        fragmentsPerPlant: x.fragmentsPerPlant,
      };
    default:
      return { ...base, targets };
  }
}

const otherSteps = fc.constantFrom(
  // Seed-set cuts use the efficacy twice (seeds per plant and seed return), so they keep a
  // fixed efficacy: a random one would make the expectation quadratic in it.
  {
    label: 'mow',
    kind: 'mowing',
    timing: 'summer',
    schedule: { kind: 'every-year' },
    seedsPerPlantReduction: 0.5,
    seedReturnReduction: 0.3,
    efficacy: { mean: 0.8, sd: 0 },
    cost,
  },
  {
    label: 'heads',
    kind: 'seed-set-prevention',
    timing: 'late-summer',
    schedule: { kind: 'every-year' },
    seedsPerPlantReduction: 0,
    seedReturnReduction: 0.7,
    efficacy: { mean: 0.9, sd: 0 },
    cost,
  },
  {
    label: 'pre',
    kind: 'pre-emergence-herbicide',
    timing: 'spring',
    schedule: { kind: 'every-year' },
    efficacy: { mean: 0.5, sd: 0.2 },
    cost,
  },
  {
    label: 'mulch',
    kind: 'mulch',
    timing: 'dormant-early-spring',
    schedule: { kind: 'year-range', first: 1, last: 2 },
    efficacy: { min: 0.2, mode: 0.5, max: 0.6 },
    cost,
  },
  {
    label: 'crop',
    kind: 'crop-competition',
    timing: 'spring',
    schedule: { kind: 'every-year' },
    efficacy: { mean: 0.4, sd: 0.1 },
    cost,
  },
);

const linearScenario = fc
  .record({
    lifeForm: fc.constantFrom('annual', 'biennial', 'perennial'),
    ageClasses: fc.integer({ min: 1, max: 4 }),
    germination: fc.array(frac(0.6), { minLength: 1, maxLength: 4 }),
    gDeep: frac(0.2),
    decay: fc.record({ shallow: frac(0.6), deep: frac(0.3) }),
    survival: frac(),
    pf: frac(),
    winter: frac(),
    regrowth: frac(),
    fragments: frac(0.5),
    loss: frac(),
    fMax: fc.double({ min: 0, max: 40, noNaN: true }),
    aggregation: fc.option(fc.double({ min: 0.5, max: 20, noNaN: true }), { nil: undefined }),
    seedbank: fc.record({
      shallow: fc.integer({ min: 0, max: 300 }),
      deep: fc.integer({ min: 0, max: 300 }),
    }),
    plants: fc.integer({ min: 0, max: 20 }),
    immigrants: fc.integer({ min: 0, max: 20 }),
    removals: fc.array(removalStep, { maxLength: 3 }),
    others: fc.array(otherSteps, { maxLength: 2 }),
  })
  .map((p) =>
    scenarioFrom('demo-perennial-dock', (s) => {
      s.profile.lifeForm = p.lifeForm;
      s.profile.ageClasses = p.ageClasses;
      s.profile.germination = { shallowByAge: p.germination.slice(0, p.ageClasses), deep: p.gDeep };
      s.profile.seedDecay = p.decay;
      s.profile.establishment = { survival: p.survival, density: { kind: 'beverton-holt', c: 0 } };
      s.profile.floweringProbability = p.pf;
      s.profile.overWinterSurvival = p.lifeForm === 'annual' ? 0 : p.winter;
      s.profile.rootCrownRegrowth = p.regrowth;
      s.profile.fragmentEstablishment = p.fragments;
      s.profile.seedRainLoss = p.loss;
      s.profile.fecundity = {
        maxSeedsPerPlant: p.fMax,
        densityCoefficient: 0,
        ...(p.aggregation === undefined ? {} : { aggregation: p.aggregation }),
      };
      s.profile.environment = { germinationCv: 0, establishmentCv: 0, fecundityCv: 0 };
      s.field.areaHa = 0.1; // 1,000 m²: counts in the thousands, so small biases show
      s.field.initialSeedbank = p.seedbank;
      s.field.initialPlants = p.plants / 10;
      s.field.immigrantSeedRain = p.immigrants / 10;
      s.strategy.steps = [...p.removals.map(toStep), ...p.others];
      s.horizonYears = 6;
      s.efficacyDraw = 'per-application';
    }),
  );

describe('stochastic mean versus mean field in the linear regime', () => {
  it('agree within 5 standard errors for every series and year', () => {
    const R = 400;
    fc.assert(
      fc.property(linearScenario, fc.integer({ min: 0, max: 1_000_000 }), (scenario, seed) => {
        const block = runReplicates({ ...scenario, seed }, 0, R);
        const mf = projectMeanField(scenario);
        const H = scenario.horizonYears;
        const area = scenario.field.areaHa * 10_000;
        for (const name of seriesNames) {
          for (let t = 0; t <= H; t++) {
            let sum = 0;
            let sumSq = 0;
            for (let r = 0; r < R; r++) {
              const v = block.series[name][r * (H + 1) + t];
              sum += v;
              sumSq += v * v;
            }
            const mean = sum / R;
            const sd = Math.sqrt(Math.max(0, (sumSq - R * mean * mean) / (R - 1)));
            const expected = mf.series[name][t];
            // Rare events: if the true mean count is below ~10/R individuals per field, all R
            // replicates can miss it (probability about e^(−R·mean)); allow 10 individuals / R.
            const rareEventFloor = 10 / (R * area);
            const tolerance = (5 * sd) / Math.sqrt(R) + rareEventFloor + 1e-9 * Math.abs(expected);
            if (Math.abs(mean - expected) > tolerance) {
              throw new Error(
                `${name}[${t}]: replicate mean ${mean} vs mean field ${expected} (±${tolerance})`,
              );
            }
          }
        }
      }),
      { seed: 2024, numRuns: 25 },
    );
  });
});
