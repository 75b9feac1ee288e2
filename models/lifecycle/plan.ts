// A scenario flattened once per run into the numbers the yearly loop reads, so the hot
// loop touches only typed arrays and plain number fields (no lookups, no allocation).
import type { Efficacy, Scenario, Step } from '../scenario/types';
import { actionPoint, isRemovalKind, timings } from '../scenario/step-kinds';
import type { ActionPoint } from '../scenario/step-kinds';
import { isScheduled } from './schedule';

/** An efficacy distribution as the samplers need it, with its expectation for the mean field. */
export interface EfficacyLaw {
  readonly triangular: boolean;
  /** Beta parameters (triangular = false). */
  readonly mean: number;
  readonly sd: number;
  /** Triangular parameters (triangular = true). */
  readonly min: number;
  readonly mode: number;
  readonly max: number;
  /** Expected value, used by the mean field. */
  readonly expected: number;
}

export interface PlannedStep {
  readonly kind: Step['kind'];
  readonly point: ActionPoint;
  readonly efficacy: EfficacyLaw;
  readonly costPerHa: number;
  /** Removal kinds: which stages the step reaches. */
  readonly hitsSeedlings: boolean;
  readonly hitsRosettes: boolean;
  readonly hitsFlowering: boolean;
  /** Removal kinds: whether efficacy is the kill fraction, the top-kill fraction, or neither. */
  readonly killIsEfficacy: boolean;
  readonly topKillIsEfficacy: boolean;
  /** Fixed top-kill fraction of the plants not killed (herbicides, spot treatment). */
  readonly topKill: number;
  /** Cultivation only. */
  readonly movesSeeds: boolean;
  readonly burial: number;
  readonly exhumation: number;
  readonly fragmentsPerPlant: number;
  /** Seed-set kinds only: fractions cut when the step fully succeeds (scaled by efficacy). */
  readonly seedsPerPlantReduction: number;
  readonly seedReturnReduction: number;
}

export interface CyclePlan {
  readonly horizonYears: number;
  readonly areaM2: number;
  readonly ageClasses: number;
  readonly germinationShallow: Float64Array;
  readonly germinationDeep: number;
  readonly keepShallow: number;
  readonly keepDeep: number;
  readonly establishmentSurvival: number;
  /** Beverton–Holt c (m²/plant); 0 under a ceiling. */
  readonly crowdingC: number;
  /** Most plants that can establish in the field (ceiling K × area, whole plants); Infinity under Beverton–Holt. */
  readonly establishmentCap: number;
  readonly maxSeedsPerPlant: number;
  readonly watkinsonA: number;
  /** Negative-binomial size per plant; Infinity for Poisson seed counts. */
  readonly aggregation: number;
  readonly floweringProbability: number;
  /** Annuals flower in their first year; biennials and perennials from age 1. */
  readonly seedlingsFlower: boolean;
  /** Perennials' flowering plants return to the established pool; annuals and biennials die after seeding. */
  readonly floweringSurvives: boolean;
  readonly overWinterSurvival: number;
  readonly rootCrownRegrowth: number;
  readonly fragmentEstablishment: number;
  readonly seedRainKeep: number;
  readonly cropCompetitionKeep: number;
  readonly germinationCv: number;
  readonly establishmentCv: number;
  readonly fecundityCv: number;
  /** Expected immigrant seeds per year over the whole field. */
  readonly immigrantSeeds: number;
  readonly initialShallow: number;
  readonly initialDeep: number;
  readonly initialPlants: number;
  readonly steps: readonly PlannedStep[];
  /** Step indices per action point, ordered by timing, then as listed in the strategy. */
  readonly preEmergence: Int32Array;
  readonly postEmergence: Int32Array;
  readonly seedSet: Int32Array;
  readonly seedProduction: Int32Array;
  readonly fall: Int32Array;
  /** active[year · steps + s] = 1 when step s is applied in year (1..horizon). */
  readonly active: Uint8Array;
  readonly efficacyPerReplicate: boolean;
}

function efficacyLaw(e: Efficacy): EfficacyLaw {
  if ('min' in e) {
    return {
      triangular: true,
      mean: 0,
      sd: 0,
      min: e.min,
      mode: e.mode,
      max: e.max,
      expected: (e.min + e.mode + e.max) / 3,
    };
  }
  return { triangular: false, mean: e.mean, sd: e.sd, min: 0, mode: 0, max: 0, expected: e.mean };
}

function planStep(step: Step): PlannedStep {
  const point = actionPoint(step.kind, step.timing);
  const targets = 'targets' in step ? step.targets : [];
  const removal = isRemovalKind(step.kind);
  return {
    kind: step.kind,
    point,
    efficacy: efficacyLaw(step.efficacy),
    costPerHa: step.cost.material + step.cost.application,
    hitsSeedlings: targets.includes('seedlings'),
    hitsRosettes: targets.includes('rosettes'),
    hitsFlowering: targets.includes('flowering'),
    killIsEfficacy: removal && step.kind !== 'hand-removal-leaving-crown',
    topKillIsEfficacy: step.kind === 'hand-removal-leaving-crown',
    topKill: 'topKill' in step ? step.topKill : 0,
    movesSeeds: step.kind === 'cultivation',
    burial: step.kind === 'cultivation' ? step.burial : 0,
    exhumation: step.kind === 'cultivation' ? step.exhumation : 0,
    fragmentsPerPlant: step.kind === 'cultivation' ? step.fragmentsPerPlant : 0,
    seedsPerPlantReduction: 'seedsPerPlantReduction' in step ? step.seedsPerPlantReduction : 0,
    seedReturnReduction: 'seedReturnReduction' in step ? step.seedReturnReduction : 0,
  };
}

function indicesAt(scenario: Scenario, planned: readonly PlannedStep[], point: ActionPoint): Int32Array {
  const order = planned
    .map((p, i) => ({ i, point: p.point, t: timings.indexOf(scenario.strategy.steps[i].timing) }))
    .filter((x) => x.point === point)
    .sort((a, b) => a.t - b.t || a.i - b.i);
  return Int32Array.from(order, (x) => x.i);
}

export function planCycle(scenario: Scenario): CyclePlan {
  const { profile, field, strategy, horizonYears } = scenario;
  const areaM2 = field.areaHa * 10_000;
  const A = profile.ageClasses;
  const byAge = profile.germination.shallowByAge;
  const germinationShallow = new Float64Array(A);
  for (let k = 0; k < A; k++) germinationShallow[k] = byAge[Math.min(k, byAge.length - 1)];
  const density = profile.establishment.density;
  const steps = strategy.steps.map(planStep);
  const active = new Uint8Array((horizonYears + 1) * steps.length);
  for (let year = 1; year <= horizonYears; year++) {
    strategy.steps.forEach((step, s) => {
      // In the let-it-seed year the steps that stop seed set are skipped, nothing else.
      const skipped = year === scenario.letItSeedYear && actionPoint(step.kind, step.timing) === 'seed-set';
      if (isScheduled(step.schedule, year) && !skipped) active[year * steps.length + s] = 1;
    });
  }
  return {
    horizonYears,
    areaM2,
    ageClasses: A,
    germinationShallow,
    germinationDeep: profile.germination.deep,
    keepShallow: 1 - profile.seedDecay.shallow,
    keepDeep: 1 - profile.seedDecay.deep,
    establishmentSurvival: profile.establishment.survival,
    crowdingC: density.kind === 'beverton-holt' ? density.c : 0,
    establishmentCap: density.kind === 'ceiling' ? Math.floor(density.K * areaM2) : Infinity,
    maxSeedsPerPlant: profile.fecundity.maxSeedsPerPlant,
    watkinsonA: profile.fecundity.densityCoefficient,
    aggregation: profile.fecundity.aggregation ?? Infinity,
    floweringProbability: profile.floweringProbability,
    seedlingsFlower: profile.lifeForm === 'annual',
    floweringSurvives: profile.lifeForm === 'perennial',
    overWinterSurvival: profile.overWinterSurvival,
    rootCrownRegrowth: profile.rootCrownRegrowth,
    fragmentEstablishment: profile.fragmentEstablishment,
    seedRainKeep: 1 - profile.seedRainLoss,
    cropCompetitionKeep: 1 - field.cropCompetition,
    germinationCv: profile.environment.germinationCv,
    establishmentCv: profile.environment.establishmentCv,
    fecundityCv: profile.environment.fecundityCv,
    immigrantSeeds: field.immigrantSeedRain * areaM2,
    // Whole seeds and plants, so the stochastic and mean-field runs start from the same counts.
    initialShallow: Math.round(field.initialSeedbank.shallow * areaM2),
    initialDeep: Math.round(field.initialSeedbank.deep * areaM2),
    initialPlants: Math.round(field.initialPlants * areaM2),
    steps,
    preEmergence: indicesAt(scenario, steps, 'pre-emergence'),
    postEmergence: indicesAt(scenario, steps, 'post-emergence'),
    seedSet: indicesAt(scenario, steps, 'seed-set'),
    seedProduction: indicesAt(scenario, steps, 'seed-production'),
    fall: indicesAt(scenario, steps, 'fall'),
    active,
    efficacyPerReplicate: scenario.efficacyDraw === 'per-replicate',
  };
}
