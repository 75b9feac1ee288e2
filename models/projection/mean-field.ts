// The deterministic mean-field projection: the same life cycle with expected values, for
// instant previews and as the stochastic model's mean in the linear regime.
import type { Scenario } from '../scenario/types';
import { meanFieldChance } from '../lifecycle/chance';
import { planCycle } from '../lifecycle/plan';
import { CycleState, YearFlows } from '../lifecycle/state';
import { advanceYear, YearScratch } from '../lifecycle/year';
import { recordCensus, recordFlows, recordStart } from './record';
import { allocateSeries } from './trajectories';
import type { ReplicateBlock } from './trajectories';

/** One trajectory in the same layout as a block of one replicate (draws = 0). */
export function projectMeanField(scenario: Scenario): ReplicateBlock {
  const plan = planCycle(scenario);
  const H = plan.horizonYears;
  const series = allocateSeries(1, H);
  const state = new CycleState(plan.ageClasses);
  const flows = new YearFlows();
  const scratch = new YearScratch();
  state.resetTo(plan);
  recordStart(series, 0, plan, state);
  for (let year = 1; year <= H; year++) {
    advanceYear(plan, state, meanFieldChance, year, null, scratch, flows);
    recordCensus(series, year, plan, state, year);
    recordFlows(series, year, plan, flows);
  }
  return { fromReplicate: 0, toReplicate: 1, years: H, series, draws: 0 };
}
