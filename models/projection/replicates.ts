// Stochastic replicates of a scenario. Replicate i always draws from streamFor(seed, i),
// so any split of [0, R) into blocks — one thread or many workers — gives the same
// numbers bit for bit once the blocks are merged.
import type { Scenario } from '../scenario/types';
import { streamFor } from '../random/stream';
import { Sampler } from '../random/sampler';
import { SampledChance } from '../lifecycle/chance';
import { planCycle } from '../lifecycle/plan';
import { CycleState, YearFlows } from '../lifecycle/state';
import { advanceYear, YearScratch } from '../lifecycle/year';
import { recordCensus, recordFlows, recordStart } from './record';
import { allocateSeries } from './trajectories';
import type { ReplicateBlock } from './trajectories';

export interface ReplicateHooks {
  /** Called after each replicate with the number finished in this block. */
  onProgress?(done: number): void;
  /** Checked before each replicate; true stops the block with ProjectionCancelledError. */
  shouldCancel?(): boolean;
}

export class ProjectionCancelledError extends Error {
  constructor(readonly done: number) {
    super(`projection cancelled after ${done} replicates`);
    this.name = 'ProjectionCancelledError';
  }
}

export function runReplicates(
  scenario: Scenario,
  fromReplicate: number,
  toReplicate: number,
  hooks: ReplicateHooks = {},
): ReplicateBlock {
  if (
    !Number.isInteger(fromReplicate) ||
    !Number.isInteger(toReplicate) ||
    fromReplicate < 0 ||
    toReplicate < fromReplicate
  ) {
    throw new RangeError(
      `replicate range [${fromReplicate}, ${toReplicate}) is not a range of non-negative whole numbers`,
    );
  }
  const plan = planCycle(scenario);
  const H = plan.horizonYears;
  const series = allocateSeries(toReplicate - fromReplicate, H);
  const state = new CycleState(plan.ageClasses);
  const flows = new YearFlows();
  const scratch = new YearScratch();
  const fixedEfficacy = plan.efficacyPerReplicate ? new Float64Array(plan.steps.length) : null;
  let draws = 0;
  for (let i = fromReplicate; i < toReplicate; i++) {
    if (hooks.shouldCancel?.()) throw new ProjectionCancelledError(i - fromReplicate);
    const sampler = new Sampler(streamFor(scenario.seed, i));
    const chance = new SampledChance(sampler);
    if (fixedEfficacy !== null) {
      for (let s = 0; s < plan.steps.length; s++) fixedEfficacy[s] = chance.efficacy(plan.steps[s].efficacy);
    }
    state.resetTo(plan);
    const base = (i - fromReplicate) * (H + 1);
    recordStart(series, base, plan, state);
    for (let year = 1; year <= H; year++) {
      advanceYear(plan, state, chance, year, fixedEfficacy, scratch, flows);
      recordCensus(series, base + year, plan, state, year);
      recordFlows(series, base + year, plan, flows);
    }
    draws += sampler.draws;
    hooks.onProgress?.(i - fromReplicate + 1);
  }
  return { fromReplicate, toReplicate, years: H, series, draws };
}
