import type { ReplayResponse } from '../../../../../shared/api/lessons';
import { yearsBackToLevel } from '../../../../../shared/lessons/measures';
import type { SliderValues } from '../../../../../shared/lessons/runs';
import { conversion, formatNumber } from '../../../shared/lib/parameterDraft';
import { useUnits } from '../../../shared/lib/units';
import type { ComputedRun } from '../useLessonRuns';
import { Figure } from './Figure';
import { RunChart } from './RunChart';

type SeedSetViewProps = {
  runs: readonly ComputedRun[];
  values: SliderValues;
  horizonYears: number;
  replay: ReplayResponse | null;
  large: boolean;
};

/**
 * One year of seed set: the same field, held near depletion, with and without one year in
 * which the seed heads are left. The lesson's answer is how many years the seedbank needs
 * to get back to where it was before that year.
 */
export function SeedSetView({ runs, values, horizonYears, replay, large }: SeedSetViewProps) {
  const { system } = useUnits();
  const c = conversion('seeds/m²', system);
  const density = (v: number) => `${formatNumber(c.toShown(v), v < 10 ? 2 : 0)} ${c.unit}`;
  const Y = values.seedYear;
  const seeded = runs[1].meanField.seedbankTotal;
  const steady = runs[0].meanField.seedbankTotal;
  const back = yearsBackToLevel(seeded, Y);
  return (
    <div className="flex flex-col gap-5">
      <RunChart
        title="The seedbank with and without one year of seed"
        summary={`The same field over ${horizonYears} years: seed heads removed every year, and the same except in year ${Y}.`}
        runs={runs}
        horizonYears={horizonYears}
        replay={replay}
        large={large}
      />
      <dl className={`grid gap-3 sm:grid-cols-2 ${large ? '' : 'lg:grid-cols-4'}`}>
        <Figure large={large} label={`Seedbank before year ${Y}`} value={density(seeded[Y - 1])} />
        <Figure large={large} label={`After year ${Y}’s seed rain`} value={density(seeded[Y])} />
        <Figure
          large={large}
          label="Back where it was after"
          value={
            <span data-figure="years-back">
              {back === null ? `more than ${horizonYears - Y} years` : `${back} year${back === 1 ? '' : 's'}`}
            </span>
          }
          note={`counted from the end of year ${Y}`}
        />
        <Figure
          large={large}
          label={`Extra seed in year ${horizonYears}`}
          value={density(seeded[horizonYears] - steady[horizonYears])}
          note="compared with removing seed heads every year"
        />
      </dl>
    </div>
  );
}
