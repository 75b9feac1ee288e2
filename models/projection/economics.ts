// Per-replicate economics from the trajectories: each year's crop yield loss from the
// season's plant stand (Cousens 1985 hyperbola), net value per ha, cumulative cost, and
// the net present value over the horizon. Row 0 (the first census) has no season, so
// its loss, value and cost are 0.
import type { Scenario } from '../scenario/types';
import { yieldLossPercent } from '../economics/yield-loss';
import { yearlyNetValue } from '../economics/net-value';
import { netPresentValue } from '../economics/npv';
import type { ReplicateBlock } from './trajectories';

export interface ReplicateEconomics {
  /** replicate-major, (years + 1) per replicate, like the trajectories. */
  readonly yieldLossPercent: Float64Array;
  readonly netValuePerHa: Float64Array;
  readonly cumulativeCostPerHa: Float64Array;
  /** One value per replicate: years 1..H discounted from the end of year 1. */
  readonly npvPerHa: Float64Array;
}

export function replicateEconomics(scenario: Scenario, block: ReplicateBlock): ReplicateEconomics {
  const { I, A } = scenario.field.yieldLoss;
  const cropValue = scenario.field.cropValuePerHa;
  const rowLength = block.years + 1;
  const replicates = block.toReplicate - block.fromReplicate;
  const loss = new Float64Array(replicates * rowLength);
  const net = new Float64Array(replicates * rowLength);
  const cumulative = new Float64Array(replicates * rowLength);
  const npv = new Float64Array(replicates);
  const established = block.series.established;
  const cost = block.series.costPerHa;
  const flows = new Array<number>(block.years);
  for (let r = 0; r < replicates; r++) {
    const base = r * rowLength;
    let spent = 0;
    for (let t = 1; t < rowLength; t++) {
      const i = base + t;
      loss[i] = yieldLossPercent(established[i], I, A);
      net[i] = yearlyNetValue({
        cropValuePerArea: cropValue,
        yieldLossPercent: loss[i],
        costPerArea: cost[i],
      });
      spent += cost[i];
      cumulative[i] = spent;
      flows[t - 1] = net[i];
    }
    npv[r] = netPresentValue(scenario.discountRate, flows);
  }
  return { yieldLossPercent: loss, netValuePerHa: net, cumulativeCostPerHa: cumulative, npvPerHa: npv };
}
