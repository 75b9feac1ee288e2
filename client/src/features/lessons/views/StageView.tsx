import { useMemo } from 'react';
import { analyzeLinearisedCycle } from '../../../../../models/lifecycle/matrix-form';
import type { ReplayResponse } from '../../../../../shared/api/lessons';
import { elasticityShares, transitionNames } from '../../../../../shared/lessons/stages';
import { formatNumber } from '../../../shared/lib/parameterDraft';
import type { ComputedRun } from '../useLessonRuns';
import { RunChart } from './RunChart';

type StageViewProps = {
  runs: readonly ComputedRun[];
  horizonYears: number;
  efficacy: number;
  replay: ReplayResponse | null;
  large: boolean;
};

type Analysed = { run: ComputedRun; lambda: number | null; reason?: string };

/** λ of a run's yearly cycle repeated without crowding (Caswell 2001, ch. 4), or why it has none. */
function analyse(run: ComputedRun): Analysed & { shares: ReturnType<typeof elasticityShares> } {
  try {
    const { stages, analysis } = analyzeLinearisedCycle(run.scenario);
    return { run, lambda: analysis.lambda, shares: elasticityShares(stages, analysis.elasticities) };
  } catch (error) {
    return { run, lambda: null, reason: (error as Error).message, shares: [] };
  }
}

/**
 * Which stage to hit: the same control, at the same efficacy, applied to one life stage at
 * a time. λ < 1 means the population shrinks in the long run; the elasticities of the
 * uncontrolled cycle say where λ is most sensitive, which is where a control pays most.
 */
export function StageView({ runs, horizonYears, efficacy, replay, large }: StageViewProps) {
  const analysed = useMemo(() => runs.map(analyse), [runs]);
  const [none, ...hits] = analysed;
  const top = Math.max(1, ...analysed.map((a) => a.lambda ?? 0));
  const best = hits.reduce<Analysed | null>(
    (b, a) => (a.lambda !== null && (b === null || a.lambda < b.lambda!) ? a : b),
    null,
  );
  return (
    <div className="flex flex-col gap-5">
      <section
        aria-labelledby="lambda-title"
        className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 break-inside-avoid"
      >
        <h3 id="lambda-title" className={large ? 'text-3xl font-semibold' : 'text-xl font-semibold'}>
          λ with {formatNumber(efficacy * 100, 0)} % control at each stage
        </h3>
        <p className={`max-w-prose text-loam-700 ${large ? 'text-xl' : 'text-sm'}`}>
          λ is how many times the population multiplies each year in the long run, with crowding left out.
          Below 1 it dies out; above 1 it grows.
        </p>
        <ul
          className="flex flex-col gap-2"
          data-lambdas={JSON.stringify(Object.fromEntries(analysed.map((a) => [a.run.id, a.lambda])))}
        >
          {analysed.map((a) => (
            <li
              key={a.run.id}
              className="grid items-center gap-1 sm:grid-cols-[18rem_minmax(0,1fr)_6rem] sm:gap-4"
            >
              <span className={`font-medium text-humus-900 ${large ? 'text-xl' : ''}`}>{a.run.label}</span>
              <span className="relative h-4 overflow-hidden rounded-full bg-silt-200" aria-hidden="true">
                <span
                  className={`block h-full rounded-full ${a.lambda !== null && a.lambda < 1 ? 'bg-sprout-700' : 'bg-russet-600'}`}
                  style={{ width: `${((a.lambda ?? 0) / top) * 100}%` }}
                />
                <span
                  className="absolute inset-y-0 w-0.5 bg-humus-900"
                  style={{ left: `${(1 / top) * 100}%` }}
                />
              </span>
              <span className={`font-semibold text-humus-900 tabular-nums ${large ? 'text-2xl' : ''}`}>
                {a.lambda === null ? 'no λ' : `λ = ${a.lambda.toFixed(2)}`}
              </span>
            </li>
          ))}
        </ul>
        {best ? (
          <p className={`rounded-seed bg-silt-100 px-4 py-3 text-humus-900 ${large ? 'text-2xl' : ''}`}>
            Hitting <strong>{best.run.label.toLowerCase()}</strong> lowers λ the most
            {best.lambda !== null && best.lambda < 1
              ? ', enough to make the population shrink.'
              : ', though not below 1.'}
          </p>
        ) : null}
      </section>
      {none.shares.length > 0 ? (
        <section
          aria-labelledby="elasticity-title"
          className="flex flex-col gap-2 rounded-seed border border-silt-300 bg-white p-5 break-inside-avoid"
        >
          <h3 id="elasticity-title" className={large ? 'text-3xl font-semibold' : 'text-xl font-semibold'}>
            Where λ rests without control
          </h3>
          <p className={`max-w-prose text-loam-700 ${large ? 'text-xl' : 'text-sm'}`}>
            Elasticities of λ summed by kind of transition: each share says how much a cut there moves λ (a 10
            % cut lowers λ by about the share × 10 %).
          </p>
          <ul className="flex flex-col gap-1">
            {none.shares.map(({ group, share }) => (
              <li
                key={group}
                className={`flex justify-between gap-4 border-b border-silt-200 py-1 ${large ? 'text-xl' : ''}`}
              >
                <span>{transitionNames[group]}</span>
                <span className="font-semibold tabular-nums">{formatNumber(share * 100, 1)} %</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <RunChart
        title="Seedbank with the control at each stage"
        summary={`The seedbank over ${horizonYears} years with no control and with the control applied to each stage in turn (log axis).`}
        runs={runs}
        horizonYears={horizonYears}
        scale="log"
        replay={replay}
        large={large}
      />
    </div>
  );
}
