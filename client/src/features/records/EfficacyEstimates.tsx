import { useId, useState } from 'react';
import type { FieldEstimates } from '../../../../shared/api/records';
import { ChartFrame } from '../../shared/charts/ChartFrame';
import { strategyStyles } from '../../shared/charts/palette';
import { SelectField } from '../../shared/components/SelectField';
import { AdoptCell, AdoptPanelFor, type AdoptSlot } from './AdoptCell';
import { fmt, pValue } from './format';
import { IntervalBars } from './IntervalBars';
import { TableScroll, td, tdLeft, th, thLeft } from './tables';

type Trial = FieldEstimates['efficacy'][number];
type Timing = Trial['timings'][number];

const pm = (mean: number, sd: number) => `${mean.toFixed(1)} ± ${sd.toFixed(1)}`;

/** One trial: per assessment timing, % control per treatment, the RCBD ANOVA and Fisher’s LSD. */
export function EfficacyEstimates({ trial, adopt }: { trial: Trial; adopt?: AdoptSlot }) {
  const [chosen, setChosen] = useState(0);
  if (trial.problem) return <p className="text-sm font-medium text-danger-700">{trial.problem}</p>;
  const timing = trial.timings[Math.min(chosen, trial.timings.length - 1)];
  if (!timing) return null;
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end gap-4">
        <div className="w-full max-w-xs">
          <SelectField
            label="Assessment timing"
            name="timing"
            value={String(chosen)}
            onChange={(e) => setChosen(Number(e.target.value))}
            options={trial.timings.map((t, i) => ({ value: String(i), label: t.timing ?? 'all plots' }))}
          />
        </div>
        <p className="max-w-prose text-sm text-loam-700">
          {timing.anova.blocks.length} blocks × {timing.anova.treatments.length} treatments; response is{' '}
          {trial.responseNote}. Untreated check “{trial.check}”: mean {fmt(timing.checkMean)}.
        </p>
      </div>
      <ControlTable timing={timing} adopt={adopt} />
      <AdoptPanelFor keys={timing.treatments.map((t) => t.adopt.key)} slot={adopt} />
      <ChartFrame
        title={`% control by treatment, ${timing.timing ?? 'all plots'}`}
        lead="The bar and the figure: mean of the per-block % control against each block’s untreated check; the whisker: its 95 % t interval over the blocks."
        exportSubtitle={`${trial.trial} · ${trial.upload.filename}`}
      >
        <IntervalBars
          title={`% control by treatment, ${timing.timing ?? 'all plots'}`}
          summary={timing.treatments
            .map(
              (t) =>
                `${t.treatment}: ${t.meanPercentControl.toFixed(0)} % (95 % interval ${t.interval.lower.toFixed(0)} to ${t.interval.upper.toFixed(0)} %)`,
            )
            .join('; ')}
          bars={timing.treatments.map((t, i) => ({
            key: t.treatment,
            label: t.treatment,
            value: t.meanPercentControl,
            lower: t.interval.lower,
            upper: t.interval.upper,
            color: strategyStyles[i % strategyStyles.length].color,
          }))}
          xLabel="% control"
          format={(v) => `${v.toFixed(0)} %`}
          domain={[
            Math.min(0, ...timing.treatments.map((t) => t.interval.lower)),
            Math.max(100, ...timing.treatments.map((t) => t.interval.upper)),
          ]}
        />
      </ChartFrame>
      <div className="grid gap-6 xl:grid-cols-2">
        <AnovaTable timing={timing} />
        <LsdTable timing={timing} />
      </div>
    </div>
  );
}

function ControlTable({ timing, adopt }: { timing: Timing; adopt?: AdoptSlot }) {
  const blocks = timing.anova.blocks;
  return (
    <TableScroll label="% control table">
      <table className="w-full min-w-[56rem] border-collapse text-sm">
        <caption className="text-left text-base font-semibold">
          % control per treatment, {timing.timing ?? 'all plots'}
        </caption>
        <thead>
          <tr className="border-b-2 border-humus-900">
            <th scope="col" className={thLeft}>
              Treatment
            </th>
            <th scope="col" className={th}>
              Mean response
            </th>
            <th scope="col" className={th}>
              % control
              <span className="block font-normal text-loam-700">on the means</span>
            </th>
            {blocks.map((b) => (
              <th key={b} scope="col" className={th}>
                Block {b}
                <span className="block font-normal text-loam-700">%</span>
              </th>
            ))}
            <th scope="col" className={th}>
              Mean ± SD
              <span className="block font-normal text-loam-700">% over blocks</span>
            </th>
            <th scope="col" className={th}>
              95 % interval
              <span className="block font-normal text-loam-700">%</span>
            </th>
            {adopt ? (
              <th scope="col" className={th}>
                <span className="sr-only">Adopt</span>
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {timing.treatments.map((t) => (
            <tr key={t.treatment} className="border-b border-silt-200">
              <th scope="row" className={`${tdLeft} font-medium`}>
                {t.treatment}
              </th>
              <td className={td}>{fmt(t.meanResponse)}</td>
              <td className={td}>{t.percentControl.toFixed(1)}</td>
              {t.perBlock.map((b) => (
                <td key={b.block} className={td}>
                  {b.percentControl.toFixed(1)}
                </td>
              ))}
              <td className={`${td} font-semibold`}>{pm(t.meanPercentControl, t.sdPercentControl)}</td>
              <td className={`${td} whitespace-nowrap`}>
                {t.interval.lower.toFixed(1)} to {t.interval.upper.toFixed(1)}
              </td>
              {adopt ? (
                <td className={td}>
                  <AdoptCell estimate={t.adopt} slot={adopt} />
                </td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroll>
  );
}

function AnovaTable({ timing }: { timing: Timing }) {
  const headingId = useId();
  const a = timing.anova;
  const rows: [string, (typeof a)['blocksRow']][] = [
    ['Blocks', a.blocksRow],
    ['Treatments', a.treatmentsRow],
    ['Error', a.errorRow],
    ['Total', a.totalRow],
  ];
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-2">
      <h4 id={headingId} className="text-lg font-semibold">
        Analysis of variance (randomised complete blocks)
      </h4>
      <TableScroll label="Analysis of variance">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">
            RCBD analysis of variance of the raw response, {timing.timing}
          </caption>
          <thead>
            <tr className="border-b-2 border-humus-900">
              <th scope="col" className={thLeft}>
                Source
              </th>
              <th scope="col" className={th}>
                df
              </th>
              <th scope="col" className={th}>
                SS
              </th>
              <th scope="col" className={th}>
                MS
              </th>
              <th scope="col" className={th}>
                F
              </th>
              <th scope="col" className={th}>
                p
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map(([name, r]) => (
              <tr
                key={name}
                className={`border-b border-silt-200 ${name === 'Total' ? 'font-semibold' : ''}`}
              >
                <th scope="row" className={`${tdLeft} font-medium`}>
                  {name}
                </th>
                <td className={td}>{r.df}</td>
                <td className={td}>{fmt(r.ss, 4)}</td>
                <td className={td}>{r.ms === null ? '' : fmt(r.ms, 4)}</td>
                <td className={td}>{r.f === null ? '' : r.f.toFixed(2)}</td>
                <td className={td}>{r.p === null ? '' : pValue(r.p)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
      <p className="text-sm text-loam-700">Coefficient of variation {a.cvPercent.toFixed(1)} %.</p>
    </section>
  );
}

function LsdTable({ timing }: { timing: Timing }) {
  const headingId = useId();
  const l = timing.lsd;
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-2">
      <h4 id={headingId} className="text-lg font-semibold">
        Pairwise comparisons (Fisher’s LSD)
      </h4>
      <p className="text-sm text-loam-700">
        LSD at α = {l.alpha}: {fmt(l.lsd, 4)} (response units). The treatment F test is{' '}
        {l.fTestSignificant
          ? 'significant, so the pairs below can be read'
          : 'not significant, so the pairs below should not be read as differences (protected LSD)'}
        .
      </p>
      <TableScroll label="Pairwise comparisons">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">
            Differences between treatment means and whether they exceed the LSD
          </caption>
          <thead>
            <tr className="border-b-2 border-humus-900">
              <th scope="col" className={thLeft}>
                Pair
              </th>
              <th scope="col" className={th}>
                Difference
              </th>
              <th scope="col" className={th}>
                Beyond LSD
              </th>
            </tr>
          </thead>
          <tbody>
            {l.comparisons.map((c) => (
              <tr key={`${c.a}|${c.b}`} className="border-b border-silt-200">
                <th scope="row" className={`${tdLeft} font-normal`}>
                  {c.a} − {c.b}
                </th>
                <td className={td}>{fmt(c.difference, 4)}</td>
                <td className={td}>{c.significant ? 'yes' : 'no'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
    </section>
  );
}
