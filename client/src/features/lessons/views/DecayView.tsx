import { useState } from 'react';
import type { ReplayResponse } from '../../../../../shared/api/lessons';
import { yearsToFraction } from '../../../../../shared/lessons/measures';
import { ChartOption } from '../../../shared/charts/ChartOption';
import { formatNumber } from '../../../shared/lib/parameterDraft';
import type { SliderValues } from '../../../../../shared/lessons/runs';
import type { ComputedRun } from '../useLessonRuns';
import { Figure, years } from './Figure';
import { RunChart } from './RunChart';

type DecayViewProps = {
  runs: readonly ComputedRun[];
  values: SliderValues;
  horizonYears: number;
  startScale: 'linear' | 'log';
  replay: ReplayResponse | null;
  large: boolean;
};

/**
 * Seedbank decay: two cohorts with no new seed. Each year a cohort keeps (1 − g)(1 − d) of
 * itself, so it halves every ln 2 / −ln((1 − g)(1 − d)) years; the figures are read off
 * the drawn lines, so they always agree with the chart.
 */
export function DecayView({ runs, values, horizonYears, startScale, replay, large }: DecayViewProps) {
  const [scale, setScale] = useState(startScale);
  const cohorts = [
    { run: runs[0], d: values.decay, g: values.germination },
    { run: runs[1], d: values.compareDecay, g: values.compareGermination },
  ];
  return (
    <div className="flex flex-col gap-5">
      <RunChart
        title="Seed left in the soil"
        summary={`Two cohorts of seed with no new seed added, over ${horizonYears} years. Each line falls by the share of seed that germinates or decays every year.`}
        runs={runs}
        horizonYears={horizonYears}
        scale={scale}
        replay={replay}
        large={large}
        controls={
          <ChartOption
            legend="Scale of the seedbank axis"
            label="Axis"
            value={scale}
            options={[
              { value: 'linear', label: 'Linear' },
              { value: 'log', label: 'Log' },
            ]}
            onChange={setScale}
          />
        }
      />
      <div className={`grid gap-4 ${large ? '' : 'md:grid-cols-2'}`}>
        {cohorts.map(({ run, d, g }) => {
          const series = run.meanField.seedbankTotal;
          const keep = (1 - g) * (1 - d);
          return (
            <section key={run.id} aria-label={run.label} className="flex flex-col gap-3">
              <h3 className={large ? 'text-3xl font-semibold' : 'text-xl font-semibold'}>{run.label}</h3>
              <dl className="grid gap-3 sm:grid-cols-3">
                <Figure
                  large={large}
                  label="Left after each year"
                  value={`${formatNumber(keep * 100, 1)} %`}
                  note="(1 − g)(1 − d)"
                />
                <Figure
                  large={large}
                  label="Half-life"
                  value={
                    <span data-figure={`${run.id}-half-life`}>
                      {years(yearsToFraction(series, 0.5), horizonYears)}
                    </span>
                  }
                  note="ln 2 / −ln((1 − g)(1 − d))"
                />
                <Figure
                  large={large}
                  label="Down to 1 %"
                  value={
                    <span data-figure={`${run.id}-one-percent`}>
                      {years(yearsToFraction(series, 0.01), horizonYears)}
                    </span>
                  }
                  note="ln 100 / −ln((1 − g)(1 − d))"
                />
              </dl>
            </section>
          );
        })}
      </div>
    </div>
  );
}
