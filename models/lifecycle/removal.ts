// Removal steps (herbicides, spot treatment, hand removal, cultivation) acting on the
// stand, and cultivation's movement of seeds between the soil layers.
//
// Each targeted plant is killed with the step's kill fraction; of the rest, the top-kill
// fraction lose their shoots and regrow from the root crown with probability r, the
// others die. Hand removal that leaves the root crown is pure top-kill (it kills only
// plants that fail to regrow); hand removal with the crown and cultivation kill outright.
import type { Chance } from './chance';
import type { PlannedStep, CyclePlan } from './plan';
import type { CycleState } from './state';

/**
 * Plants of one pool left standing and those that regrew, written to `hit` so the caller
 * can route regrowth (a flowering plant cut in summer loses this year's seed).
 */
export class HitOutcome {
  untouched = 0;
  regrown = 0;
  killed = 0;
}

export function hitPool(
  n: number,
  kill: number,
  topKill: number,
  regrowth: number,
  chance: Chance,
  out: HitOutcome,
): void {
  const killed = chance.binomial(n, kill);
  const topped = chance.binomial(n - killed, topKill);
  const regrown = chance.binomial(topped, regrowth);
  out.untouched = n - killed - topped;
  out.regrown = regrown;
  out.killed = killed + topped - regrown;
}

/**
 * Applies one removal step with efficacy e to the pools its targets name. At the seed-set
 * point (`afterFlowering`), flowering plants that regrow from the crown become vegetative
 * for the rest of the year; elsewhere regrown plants keep their stage.
 */
export function applyRemoval(
  plan: CyclePlan,
  step: PlannedStep,
  e: number,
  state: CycleState,
  chance: Chance,
  afterFlowering: boolean,
  hit: HitOutcome,
): void {
  const kill = step.killIsEfficacy ? e : 0;
  const topKill = step.topKillIsEfficacy ? e : step.topKill;
  const r = plan.rootCrownRegrowth;
  let killed = 0;
  if (step.hitsSeedlings) {
    hitPool(state.seedlings, kill, topKill, r, chance, hit);
    state.seedlings = hit.untouched + hit.regrown;
    killed += hit.killed;
  }
  if (step.hitsRosettes) {
    hitPool(state.rosettes, kill, topKill, r, chance, hit);
    state.rosettes = hit.untouched + hit.regrown;
    killed += hit.killed;
  }
  if (step.hitsFlowering) {
    hitPool(state.flowering, kill, topKill, r, chance, hit);
    if (afterFlowering) {
      state.flowering = hit.untouched;
      state.rosettes += hit.regrown;
    } else {
      state.flowering = hit.untouched + hit.regrown;
    }
    killed += hit.killed;
  }
  if (step.movesSeeds) {
    // Cutting roots spreads a perennial: each killed plant leaves fragments, some establish.
    const meanFragments = killed * step.fragmentsPerPlant * plan.fragmentEstablishment;
    state.fragments += chance.poisson(meanFragments);
    moveSeeds(step, state, chance);
  }
}

/** Soil disturbance: burial takes shallow seeds down, exhumation brings deep seeds up (both from pre-move counts). */
function moveSeeds(step: PlannedStep, state: CycleState, chance: Chance): void {
  const bank = state.bank;
  const A = state.ageClasses;
  for (let k = 0; k < A; k++) {
    const down = chance.binomial(bank[k], step.burial);
    const up = chance.binomial(bank[A + k], step.exhumation);
    bank[k] += up - down;
    bank[A + k] += down - up;
  }
  const down = chance.binomial(state.freshShallow, step.burial);
  const up = chance.binomial(state.freshDeep, step.exhumation);
  state.freshShallow += up - down;
  state.freshDeep += down - up;
}
