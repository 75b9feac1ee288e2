// Writes the census and the year's flows of one replicate into its rows of a block.
import type { CyclePlan } from '../lifecycle/plan';
import type { CycleState, YearFlows } from '../lifecycle/state';
import type { SeriesName } from './trajectories';

// Beyond 2^53 counts are no longer exact integers in a double, and the samplers refuse them.
const LARGEST_EXACT_COUNT = Number.MAX_SAFE_INTEGER;

export function recordCensus(
  series: Record<SeriesName, Float64Array>,
  row: number,
  plan: CyclePlan,
  state: CycleState,
  year: number,
): void {
  const shallow = state.shallowTotal();
  const deep = state.deepTotal();
  if (shallow + deep > LARGEST_EXACT_COUNT) {
    throw new RangeError(
      `the seedbank exceeds 2^53 seeds in year ${year}: the scenario grows without bound (add density dependence or shorten the horizon)`,
    );
  }
  const area = plan.areaM2;
  series.seedbankShallow[row] = shallow / area;
  series.seedbankDeep[row] = deep / area;
  series.seedbankTotal[row] = (shallow + deep) / area;
}

export function recordFlows(
  series: Record<SeriesName, Float64Array>,
  row: number,
  plan: CyclePlan,
  flows: YearFlows,
): void {
  const area = plan.areaM2;
  series.emerged[row] = flows.emerged / area;
  series.established[row] = flows.established / area;
  series.flowering[row] = flows.flowering / area;
  series.seedsProduced[row] = flows.seedsProduced / area;
  series.seedRain[row] = flows.seedRain / area;
  series.costPerHa[row] = flows.costPerHa;
}

/** Row 0: the first census; flows are zero and "established" is the entered plant stand. */
export function recordStart(
  series: Record<SeriesName, Float64Array>,
  row: number,
  plan: CyclePlan,
  state: CycleState,
): void {
  recordCensus(series, row, plan, state, 0);
  series.established[row] = state.rosettes / plan.areaM2;
}
