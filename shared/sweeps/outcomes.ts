// The outcomes a sweep records at each point, each one number computed from the point's
// replicates: the same definitions as the projection summary (models/projection/summarise),
// so a sweep point reads like a projection with those inputs.
import type { Scenario } from '../../models/scenario/types';
import type { ReplicateBlock } from '../../models/projection/trajectories';
import { replicateEconomics } from '../../models/projection/economics';
import { yearsUntilDecline } from '../../models/summary/decline';
import { quantileSorted } from '../../models/summary/quantile';

export const outcomeKinds = ['seedbank', 'plants', 'depletion', 'decline90', 'npv'] as const;
export type OutcomeKind = (typeof outcomeKinds)[number];

export interface OutcomeInfo {
  label: string;
  /** Metric unit; the client converts the area-bound ones. */
  unit: string;
  /** Whether the outcome is read at the sweep's year T (the others span the horizon). */
  atYear: boolean;
  meaning: string;
}

export const outcomeInfo: Record<OutcomeKind, OutcomeInfo> = {
  seedbank: {
    label: 'Seedbank in year T',
    unit: 'seeds/m²',
    atYear: true,
    meaning: 'Mean over replicates of the total seedbank (both layers) at the census ending year T.',
  },
  plants: {
    label: 'Plants in year T',
    unit: 'plants/m²',
    atYear: true,
    meaning: 'Mean over replicates of the established plants standing in year T.',
  },
  depletion: {
    label: 'Probability of depletion in year T',
    unit: 'probability',
    atYear: true,
    meaning:
      'Share of replicates whose seedbank is below the depletion threshold in year T (as the projection summary counts it).',
  },
  decline90: {
    label: 'Years to 90 % decline',
    unit: 'years',
    atYear: false,
    meaning:
      'Median over replicates of the first year the seedbank is 90 % below year 0; a replicate that never gets there within the horizon counts as horizon + 1.',
  },
  npv: {
    label: 'Net present value',
    unit: 'currency/ha',
    atYear: false,
    meaning: 'Mean over replicates of the net present value per ha over the horizon.',
  },
};

/** The label with T filled in, e.g. "Seedbank in year 10". */
export const outcomeLabel = (kind: OutcomeKind, year: number) =>
  outcomeInfo[kind].label.replace('year T', `year ${year}`);

const mean = (data: Float64Array, replicates: number, stride: number, offset: number) => {
  let sum = 0;
  for (let r = 0; r < replicates; r++) sum += data[r * stride + offset];
  return sum / replicates;
};

/** The chosen outcomes of one point's replicates. */
export function pointOutcomes(
  scenario: Scenario,
  block: ReplicateBlock,
  kinds: readonly OutcomeKind[],
  year: number,
): Partial<Record<OutcomeKind, number>> {
  const R = block.toReplicate - block.fromReplicate;
  const stride = block.years + 1;
  const out: Partial<Record<OutcomeKind, number>> = {};
  for (const kind of kinds) {
    switch (kind) {
      case 'seedbank':
        out.seedbank = mean(block.series.seedbankTotal, R, stride, year);
        break;
      case 'plants':
        out.plants = mean(block.series.established, R, stride, year);
        break;
      case 'depletion': {
        let below = 0;
        for (let r = 0; r < R; r++)
          if (block.series.seedbankTotal[r * stride + year] < scenario.depletionThreshold) below++;
        out.depletion = below / R;
        break;
      }
      case 'decline90': {
        // Censored at horizon + 1 so the outcome is always a number an analysis can rank.
        const years = new Float64Array(R);
        for (let r = 0; r < R; r++) {
          const t = yearsUntilDecline(block.series.seedbankTotal.subarray(r * stride, (r + 1) * stride), 0.9);
          years[r] = t ?? block.years + 1;
        }
        out.decline90 = quantileSorted(years.sort(), 0.5);
        break;
      }
      case 'npv': {
        const npv = replicateEconomics(scenario, block).npvPerHa;
        out.npv = mean(npv, R, 1, 0);
        break;
      }
    }
  }
  return out;
}
