import { useState } from 'react';
import type { SweepView } from '../../../../shared/api/sweeps';
import { outcomeInfo, outcomeLabel, type OutcomeKind } from '../../../../shared/sweeps/outcomes';
import { ChartFrame } from '../../shared/charts/ChartFrame';
import { ChartOption } from '../../shared/charts/ChartOption';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useUnits } from '../../shared/lib/units';
import { useSweepAnalysis } from './api';
import { NumbersTable } from './chartParts';
import { formatNumber, formatValue, outcomeTitle, shown, unitShown } from './display';
import { PanelsChart } from './PanelsChart';
import { PrccChart, SIGNIFICANCE } from './PrccChart';
import { SobolChart } from './SobolChart';
import { TornadoChart } from './TornadoChart';

const fixed = (x: number | null, digits = 3) => (x === null ? 'n/a' : x.toFixed(digits));

/** The design's own chart for one outcome, and the scatter of that outcome against each parameter. */
export function AnalysisSection({ sweep, workspaceId }: { sweep: SweepView; workspaceId: string }) {
  const { system } = useUnits();
  const [outcome, setOutcome] = useState<OutcomeKind>(sweep.outcomes[0]);
  const query = useSweepAnalysis(workspaceId, sweep.id, outcome, sweep.pointsDone);
  const unit = outcomeInfo[outcome].unit;
  const yTitle = outcomeTitle(outcome, sweep.outcomeYear, system);
  const label = outcomeLabel(outcome, sweep.outcomeYear);
  const labelOf = (path: string) => sweep.parameters.find((p) => p.path === path)?.label ?? path;
  const subtitle = `${sweep.name} · ${sweep.strategyName} · seed ${sweep.seed} · ${sweep.replicatesPerPoint} replicates per point`;
  const toShown = (v: number) => (unit === 'probability' ? v : shown(v, unit, system).value);
  const formatShown = (v: number) =>
    unit === 'probability' ? v.toFixed(2) : formatNumber(v, 'plain', system);

  return (
    <section aria-labelledby="sweep-analysis" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="sweep-analysis" className="text-2xl font-semibold">
          What drives the outcome
        </h2>
        {sweep.outcomes.length > 1 ? (
          <ChartOption
            legend="Outcome analysed"
            label="Outcome"
            value={outcome}
            options={sweep.outcomes.map((k) => ({ value: k, label: outcomeLabel(k, sweep.outcomeYear) }))}
            onChange={setOutcome}
          />
        ) : null}
      </div>
      {query.isPending ? (
        <LoadingNotice>Analysing the points…</LoadingNotice>
      ) : query.isError ? (
        <ErrorNotice
          title="The analysis could not be made"
          error={query.error}
          onRetry={() => void query.refetch()}
        />
      ) : (
        <>
          {query.data.pending ? (
            <p role="status" className="rounded-seed bg-silt-100 px-4 py-3 text-sm text-humus-900">
              {query.data.pending}.
            </p>
          ) : null}
          {query.data.tornado ? (
            <ChartFrame
              title={`Tornado: ${label}`}
              exportSubtitle={subtitle}
              lead="Each bar: the outcome with that parameter alone at its min and at its max, the others at the scenario’s values (the vertical line)."
            >
              <TornadoChart
                tornado={query.data.tornado}
                labelOf={labelOf}
                toShown={toShown}
                format={formatShown}
                xLabel={yTitle}
                title={`Tornado chart of ${label}`}
              />
              <NumbersTable
                caption={`Tornado chart of ${label}`}
                headers={['Parameter', 'At min', 'At max', 'Swing']}
                rows={query.data.tornado.bars.map((b) => [
                  labelOf(b.path),
                  formatValue(b.outcomeAtLow, unit, system),
                  formatValue(b.outcomeAtHigh, unit, system),
                  formatValue(b.swing, unit, system),
                ])}
              />
            </ChartFrame>
          ) : null}
          {query.data.prcc ? (
            <ChartFrame
              title={`Partial rank correlation: ${label}`}
              exportSubtitle={subtitle}
              lead={`How monotone the outcome is in each parameter once the others are accounted for (Marino et al. 2008). Solid, starred bars: p < ${SIGNIFICANCE}.`}
            >
              <PrccChart
                prcc={query.data.prcc}
                labelOf={labelOf}
                title={`PRCC of ${label} with each parameter`}
              />
              <NumbersTable
                caption={`PRCC of ${label}`}
                headers={['Parameter', 'PRCC', 'p-value', 'Degrees of freedom']}
                rows={query.data.prcc.map((p) => [
                  labelOf(p.path),
                  fixed(p.coefficient),
                  p.pValue === null
                    ? 'n/a'
                    : p.pValue < 0.001
                      ? p.pValue.toExponential(1)
                      : p.pValue.toFixed(3),
                  String(p.degreesOfFreedom),
                ])}
              />
            </ChartFrame>
          ) : null}
          {query.data.sobol ? (
            <ChartFrame
              title={`Sobol’ indices: ${label}`}
              exportSubtitle={subtitle}
              lead={`On ${query.data.sobol.baseSamples} base samples; intervals from ${query.data.sobol.bootstrapDraws} bootstrap resamples.`}
            >
              <SobolChart sobol={query.data.sobol} labelOf={labelOf} title={`Sobol’ indices of ${label}`} />
              <NumbersTable
                caption={`Sobol’ indices of ${label}`}
                headers={['Parameter', 'First order', 'interval', 'Total', 'interval']}
                rows={query.data.sobol.indices.map((s) => [
                  labelOf(s.path),
                  fixed(s.first.value),
                  `${fixed(s.first.low)} – ${fixed(s.first.high)}`,
                  fixed(s.total.value),
                  `${fixed(s.total.low)} – ${fixed(s.total.high)}`,
                ])}
              />
            </ChartFrame>
          ) : null}
          {query.data.mainEffects ? (
            <ChartFrame
              title={`Main effects: ${label}`}
              exportSubtitle={subtitle}
              lead="The mean outcome at each level of a parameter, over every combination of the others."
            >
              <PanelsChart
                title={`Main effects on ${label}`}
                kind="line"
                yLabel={yTitle}
                format={formatShown}
                panels={query.data.mainEffects.map((m) => {
                  const p = sweep.parameters.find((q) => q.path === m.path)!;
                  return {
                    key: m.path,
                    label: labelOf(m.path),
                    x: m.levels.map((v) => shown(v, p.unit, system).value),
                    y: m.means.map(toShown),
                    xUnit: unitShown(p.unit, system),
                  };
                })}
              />
            </ChartFrame>
          ) : null}
          {query.data.scatter.outcome.length > 0 ? (
            <ChartFrame
              title={`Scatter: ${label} against each parameter`}
              exportSubtitle={subtitle}
              lead={
                query.data.scatter.thinned
                  ? 'One dot per point, evenly thinned to a few thousand.'
                  : 'One dot per finished point.'
              }
            >
              <PanelsChart
                title={`${label} against each parameter`}
                kind="scatter"
                yLabel={yTitle}
                format={formatShown}
                panels={sweep.parameters.map((p, j) => ({
                  key: p.path,
                  label: p.label,
                  x: query.data.scatter.inputs[j].map((v) => shown(v, p.unit, system).value),
                  y: query.data.scatter.outcome.map(toShown),
                  xUnit: unitShown(p.unit, system),
                }))}
              />
            </ChartFrame>
          ) : null}
        </>
      )}
    </section>
  );
}
