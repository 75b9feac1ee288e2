// One year of the life cycle, census to census (late winter, before emergence), in this
// fixed order:
//
//  1. Emergence: shallow seeds of age class k emerge with g_k (age-dependent, e.g. g_0 = 0
//     for first-year dormancy), deep seeds with g_deep, both times the year's germination
//     multiplier. Emerged seeds leave the seedbank whether or not they survive.
//  2. Pre-emergence steps (pre-emergence herbicide, mulch; timing dormant/early spring or
//     spring) kill a fraction (the efficacy) of the emerging seedlings.
//  3. Establishment with survival s_e times the year's establishment multiplier, crowded
//     either by Beverton–Holt, s_e / (1 + c·N) with N the emerging seedlings per m² (a smooth
//     decline: every extra seedling lowers everyone's chance a little), or by a ceiling of
//     K plants/m² (no crowding below K, hard cap above: a limited number of safe sites).
//     The profile says which.
//  4. Post-emergence point: removal steps timed dormant/early spring or spring act on
//     seedlings and older plants (the model has one emergence flush, so an early-spring
//     step and a spring step act at the same point, in that order). Kill and top-kill with
//     root-crown regrowth are in removal.ts; cultivation here also moves seeds.
//  5. Flowering with p_f: annuals' plants flower in their first year; biennials' and
//     perennials' only from age 1 (plants that have lived through a winter).
//  6. Seed-set point: steps timed summer or late summer, in that order: mowing/shoot
//     removal cuts seeds per plant, seed-set prevention cuts seed return (each scaled by
//     its efficacy), and removal steps act on seedlings, rosettes and flowering plants
//     (a flowering plant cut back that regrows from the crown sets no seed this year).
//  7. Seed production per flowering plant: Watkinson (1980) f_max / (1 + a·F), F flowering
//     plants per m², times the crop's competition, any crop-competition steps, the year's
//     fecundity multiplier and the seed-set cuts. Counts are Poisson, or negative binomial
//     when the profile gives an aggregation.
//  8. Seed rain: a fraction is lost (predation, removal with harvest), the rest plus any
//     immigrant seed rain joins the shallow layer as this year's fresh seed.
//  9. Fall point: steps timed fall; cultivation moves seeds (fresh seed included) between
//     the layers and fragments roots into new plants.
// 10. Over-winter survival of established plants; flowering perennials return to the
//     established pool, flowering annuals and biennials die after seeding.
// 11. Seedbank decay (survival 1 − d of the layer) and ageing: fresh seed becomes class 0,
//     class k becomes k+1, the last class keeps its survivors.
//
// Crop-competition steps act at stage 7 whatever their timing (the timing records when the
// crop or cover is sown). Environmental multipliers are drawn once at the start of the year
// and shared by every cohort and stage they scale; probabilities they push above 1 are cut
// to 1. Efficacy is one draw per replicate (drawn before year 1) or one per application.
import type { Chance } from './chance';
import type { CyclePlan } from './plan';
import { applyRemoval, HitOutcome } from './removal';
import type { CycleState, YearFlows } from './state';

/** Per-run scratch for the year, so the loop allocates nothing. */
export class YearScratch {
  readonly hit = new HitOutcome();
}

function efficacyOf(plan: CyclePlan, s: number, chance: Chance, fixedEfficacy: Float64Array | null): number {
  return fixedEfficacy === null ? chance.efficacy(plan.steps[s].efficacy) : fixedEfficacy[s];
}

/**
 * Advances `state` by one year (year counts 1..horizon and selects the scheduled steps) and
 * writes the year's flows. `fixedEfficacy` holds per-replicate draws, or null to draw at
 * every application.
 */
export function advanceYear(
  plan: CyclePlan,
  state: CycleState,
  chance: Chance,
  year: number,
  fixedEfficacy: Float64Array | null,
  scratch: YearScratch,
  flows: YearFlows,
): void {
  const A = plan.ageClasses;
  const bank = state.bank;
  const area = plan.areaM2;
  const stepCount = plan.steps.length;
  const activeBase = year * stepCount;
  const active = plan.active;

  const germinationMultiplier = plan.germinationCv > 0 ? chance.environment(plan.germinationCv) : 1;
  const establishmentMultiplier = plan.establishmentCv > 0 ? chance.environment(plan.establishmentCv) : 1;
  const fecundityMultiplier = plan.fecundityCv > 0 ? chance.environment(plan.fecundityCv) : 1;

  let cost = 0;
  for (let s = 0; s < stepCount; s++) if (active[activeBase + s] === 1) cost += plan.steps[s].costPerHa;

  // 1. Emergence.
  let emerged = 0;
  const gDeep = Math.min(1, plan.germinationDeep * germinationMultiplier);
  for (let k = 0; k < A; k++) {
    const fromShallow = chance.binomial(
      bank[k],
      Math.min(1, plan.germinationShallow[k] * germinationMultiplier),
    );
    const fromDeep = chance.binomial(bank[A + k], gDeep);
    bank[k] -= fromShallow;
    bank[A + k] -= fromDeep;
    emerged += fromShallow + fromDeep;
  }

  // 2. Pre-emergence steps.
  let emerging = emerged;
  const pre = plan.preEmergence;
  for (let i = 0; i < pre.length; i++) {
    const s = pre[i];
    if (active[activeBase + s] === 1)
      emerging -= chance.binomial(emerging, efficacyOf(plan, s, chance, fixedEfficacy));
  }

  // 3. Establishment.
  let pEstablish = Math.min(1, plan.establishmentSurvival * establishmentMultiplier);
  if (plan.crowdingC > 0) pEstablish /= 1 + (plan.crowdingC * emerging) / area;
  state.seedlings = Math.min(chance.binomial(emerging, pEstablish), plan.establishmentCap);
  state.flowering = 0;
  state.fragments = 0;

  // 4. Post-emergence point.
  const post = plan.postEmergence;
  for (let i = 0; i < post.length; i++) {
    const s = post[i];
    if (active[activeBase + s] === 1) {
      applyRemoval(
        plan,
        plan.steps[s],
        efficacyOf(plan, s, chance, fixedEfficacy),
        state,
        chance,
        false,
        scratch.hit,
      );
    }
  }
  flows.established = state.seedlings + state.rosettes;

  // 5. Flowering.
  const pf = plan.floweringProbability;
  if (plan.seedlingsFlower) {
    const f = chance.binomial(state.seedlings, pf);
    state.seedlings -= f;
    state.flowering += f;
  }
  const fr = chance.binomial(state.rosettes, pf);
  state.rosettes -= fr;
  state.flowering += fr;

  // 6. Seed-set point.
  let seedsPerPlantKeep = 1;
  let seedReturnKeep = 1;
  const seedSet = plan.seedSet;
  for (let i = 0; i < seedSet.length; i++) {
    const s = seedSet[i];
    if (active[activeBase + s] !== 1) continue;
    const step = plan.steps[s];
    const e = efficacyOf(plan, s, chance, fixedEfficacy);
    if (step.kind === 'mowing' || step.kind === 'seed-set-prevention') {
      seedsPerPlantKeep *= 1 - e * step.seedsPerPlantReduction;
      seedReturnKeep *= 1 - e * step.seedReturnReduction;
    } else {
      applyRemoval(plan, step, e, state, chance, true, scratch.hit);
    }
  }
  flows.flowering = state.flowering;

  // 7. Seed production.
  let competitionKeep = plan.cropCompetitionKeep;
  const production = plan.seedProduction;
  for (let i = 0; i < production.length; i++) {
    const s = production[i];
    if (active[activeBase + s] === 1) competitionKeep *= 1 - efficacyOf(plan, s, chance, fixedEfficacy);
  }
  const F = state.flowering;
  let produced = 0;
  if (F > 0) {
    const perPlant =
      (plan.maxSeedsPerPlant / (1 + (plan.watkinsonA * F) / area)) *
      competitionKeep *
      fecundityMultiplier *
      seedsPerPlantKeep;
    produced = chance.seedCount(F * perPlant, plan.aggregation * F);
  }

  // 8. Seed rain.
  const returned = chance.binomial(produced, plan.seedRainKeep * seedReturnKeep);
  const immigrants = chance.poisson(plan.immigrantSeeds);
  state.freshShallow = returned + immigrants;
  state.freshDeep = 0;

  // 9. Fall point.
  const fall = plan.fall;
  for (let i = 0; i < fall.length; i++) {
    const s = fall[i];
    if (active[activeBase + s] === 1) {
      applyRemoval(
        plan,
        plan.steps[s],
        efficacyOf(plan, s, chance, fixedEfficacy),
        state,
        chance,
        false,
        scratch.hit,
      );
    }
  }

  // 10. Over-winter survival.
  const alive =
    state.seedlings + state.rosettes + state.fragments + (plan.floweringSurvives ? state.flowering : 0);
  state.rosettes = chance.binomial(alive, plan.overWinterSurvival);

  // 11. Decay and ageing, per layer.
  ageLayer(bank, 0, A, plan.keepShallow, state.freshShallow, chance);
  ageLayer(bank, A, A, plan.keepDeep, state.freshDeep, chance);

  flows.emerged = emerged;
  flows.seedsProduced = produced;
  flows.seedRain = returned + immigrants;
  flows.costPerHa = cost;
}

function ageLayer(
  bank: Float64Array,
  offset: number,
  A: number,
  keep: number,
  fresh: number,
  chance: Chance,
): void {
  if (A === 1) {
    bank[offset] = chance.binomial(bank[offset], keep) + chance.binomial(fresh, keep);
    return;
  }
  const last = offset + A - 1;
  bank[last] = chance.binomial(bank[last], keep) + chance.binomial(bank[last - 1], keep);
  for (let k = last - 1; k > offset; k--) bank[k] = chance.binomial(bank[k - 1], keep);
  bank[offset] = chance.binomial(fresh, keep);
}
