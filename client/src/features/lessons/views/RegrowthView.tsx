import type { ReplayResponse } from '../../../../../shared/api/lessons';
import { conversion, formatNumber } from '../../../shared/lib/parameterDraft';
import { useUnits } from '../../../shared/lib/units';
import type { ComputedRun } from '../useLessonRuns';
import { Figure } from './Figure';
import { RunChart } from './RunChart';

type RegrowthViewProps = {
  runs: readonly ComputedRun[];
  horizonYears: number;
  replay: ReplayResponse | null;
  large: boolean;
};

/**
 * Annual versus perennial: one shoot removal each summer, on plants that regrow from the
 * root crown and on the same plants if they could not. The gap between the lines is what
 * the root crown is worth to the weed.
 */
export function RegrowthView({ runs, horizonYears, replay, large }: RegrowthViewProps) {
  const { system } = useUnits();
  const plants = conversion('plants/m²', system);
  const seeds = conversion('seeds/m²', system);
  const last = (run: ComputedRun, key: 'established' | 'seedbankTotal') => run.meanField[key][horizonYears];
  return (
    <div className="flex flex-col gap-5">
      <div className="grid gap-5 xl:grid-cols-2">
        <RunChart
          title="Established plants"
          summary="Plants standing after the spring each year, with and without regrowth from the root crown after the same summer shoot removal."
          runs={runs}
          horizonYears={horizonYears}
          measure="established"
          replay={replay}
          large={large}
        />
        <RunChart
          title="Seedbank"
          summary="Viable seed in the soil each year under the same shoot removal, with and without root-crown regrowth."
          runs={runs}
          horizonYears={horizonYears}
          replay={replay}
          large={large}
        />
      </div>
      <dl className="grid gap-3 sm:grid-cols-2">
        {runs.map((run) => (
          <Figure
            key={run.id}
            large={large}
            label={`${run.label}, year ${horizonYears}`}
            value={`${formatNumber(plants.toShown(last(run, 'established')), 2)} ${plants.unit}`}
            note={`seedbank ${formatNumber(seeds.toShown(last(run, 'seedbankTotal')), 0)} ${seeds.unit}`}
          />
        ))}
      </dl>
    </div>
  );
}
