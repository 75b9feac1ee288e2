import { useId, useState } from 'react';
import { Button } from '../../shared/components/Button';
import { SelectField } from '../../shared/components/SelectField';
import { downloadCsv } from '../../shared/lib/csv';
import { fileSlug } from '../../shared/lib/download';
import { formatPercent, useDisplayUnits } from './display';
import { converter, formatterOf, measureByKey, measures, unitOf } from './measures';
import type { FinishedProjection } from './result';

/**
 * The year-by-year numbers behind the charts, one measure at a time on screen; the CSV
 * holds every measure in tidy long form (one row per year and measure) in the units shown.
 */
export function YearTable({ projection }: { projection: FinishedProjection }) {
  const units = useDisplayUnits();
  const [measureKey, setMeasureKey] = useState('seedbankTotal');
  const captionId = useId();
  const summary = projection.result.summary;
  const measure = measureByKey(measureKey);
  const series = measure.series(summary);
  const convert = converter(measure.kind, units);
  const format = formatterOf(measure.kind);
  const unit = unitOf(measure.kind, units);
  const showDepletion = measure.key === 'seedbankTotal';

  const exportCsv = () => {
    const rows = measures.flatMap((m) => {
      const s = m.series(summary);
      const c = converter(m.kind, units);
      return summary.years.map((year, t) => [
        year,
        m.key,
        unitOf(m.kind, units),
        c(s.mean[t]),
        s.sd[t] === null ? null : c(s.sd[t]!),
        c(s.q05[t]),
        c(s.q25[t]),
        c(s.q50[t]),
        c(s.q75[t]),
        c(s.q95[t]),
      ]);
    });
    const depletion = summary.years.map((year, t) => [
      year,
      'depletionProbability',
      'probability',
      summary.depletionProbability[t],
      null,
      null,
      null,
      null,
      null,
      null,
    ]);
    downloadCsv(
      `${fileSlug(projection.label)}-seed-${projection.seed}-years`,
      ['year', 'measure', 'unit', 'mean', 'sd', 'q05', 'q25', 'median', 'q75', 'q95'],
      [...rows, ...depletion],
    );
  };

  return (
    <section
      aria-labelledby={captionId}
      className="flex flex-col gap-4 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <div className="flex flex-wrap items-end justify-between gap-4">
        <h2 id={captionId} className="text-2xl font-semibold">
          Year by year
        </h2>
        <div className="flex flex-wrap items-end gap-3 print:hidden">
          <SelectField
            label="Measure"
            name="measure"
            size="sm"
            value={measureKey}
            onChange={(e) => setMeasureKey(e.target.value)}
            options={measures.map((m) => ({ value: m.key, label: m.label }))}
          />
          <Button variant="secondary" size="sm" onClick={exportCsv}>
            Download table (CSV, all measures)
          </Button>
        </div>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[36rem] border-collapse text-sm">
          <caption className="sr-only">
            {measure.label} by year, in {unit}, across {summary.replicates} replicates
          </caption>
          <thead>
            <tr className="border-b-2 border-humus-900 text-left">
              <th scope="col" className="py-2 pr-3 font-semibold">
                Year
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Mean ({unit})
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Median
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                5 %
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                95 %
              </th>
              {showDepletion ? (
                <th scope="col" className="py-2 pl-3 text-right font-semibold">
                  Depleted
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {summary.years.map((year, t) => (
              <tr key={year} className="border-b border-silt-200">
                <th scope="row" className="py-1.5 pr-3 text-left font-medium">
                  {year === 0 ? '0 (start)' : year}
                </th>
                <td className="px-3 py-1.5 text-right">{format(convert(series.mean[t]))}</td>
                <td className="px-3 py-1.5 text-right font-semibold">{format(convert(series.q50[t]))}</td>
                <td className="px-3 py-1.5 text-right text-loam-700">{format(convert(series.q05[t]))}</td>
                <td className="px-3 py-1.5 text-right text-loam-700">{format(convert(series.q95[t]))}</td>
                {showDepletion ? (
                  <td className="py-1.5 pl-3 text-right">{formatPercent(summary.depletionProbability[t])}</td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-loam-700">
        Median, 5 % and 95 % are across the {summary.replicates} replicates of each year; “Depleted” is the
        share of replicates below the depletion threshold.
      </p>
    </section>
  );
}
