import { useId } from 'react';
import { Link } from 'react-router-dom';
import { StyleSwatch } from '../../shared/charts/marks';
import { Button } from '../../shared/components/Button';
import { downloadCsv } from '../../shared/lib/csv';
import { fileSlug } from '../../shared/lib/download';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { summaryCsv, summaryRows, type Compared } from './comparison';
import { checkpointYears } from '../../../../shared/projection/comparison';
import { formatAmount, formatMoney, formatPercent, formatSignedMoney, useDisplayUnits } from './display';

const th = 'px-3 py-2 text-right align-bottom font-semibold';
const td = 'px-3 py-2 text-right align-top';

/** The comparison's summary: one row per strategy and No control, every number with its unit. */
export function SummaryTable({
  compared,
  title,
  seed,
}: {
  compared: readonly Compared[];
  title: string;
  seed: number;
}) {
  const units = useDisplayUnits();
  const workspace = useCurrentWorkspace();
  const headingId = useId();
  if (compared.length === 0) return null;
  const horizon = compared[0].projection.result.summary.horizonYears;
  const rows = summaryRows(compared, units);
  const years = checkpointYears(horizon);
  const money = `per ${units.area}`;

  const exportCsv = () => {
    const { header, body } = summaryCsv(rows, units, horizon);
    downloadCsv(`${fileSlug(title)}-seed-${seed}-summary`, header, body);
  };

  return (
    <section
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id={headingId} className="text-2xl font-semibold">
            Summary
          </h2>
          <p className="mt-1 max-w-prose text-sm text-loam-700">
            Medians across replicates, with the 90 % band (5–95 %) beneath. Money is per {units.area}; NPV is
            discounted at the scenario’s rate over {horizon} years.
          </p>
        </div>
        <Button variant="secondary" size="sm" onClick={exportCsv} className="print:hidden">
          Download table (CSV)
        </Button>
      </div>
      <div
        className="overflow-x-auto"
        tabIndex={0}
        role="region"
        aria-label="Summary table, scrolls sideways"
      >
        <table className="w-full min-w-[60rem] border-collapse text-sm">
          <caption className="sr-only">
            Summary of each strategy and No control over {horizon} years,{' '}
            {units.system === 'us' ? 'US customary' : 'metric'} units
          </caption>
          <thead>
            <tr className="border-b-2 border-humus-900">
              <th scope="col" className="min-w-52 py-2 pr-3 text-left align-bottom font-semibold">
                Strategy
              </th>
              {years.map((y) => (
                <th key={y} scope="col" className={th}>
                  Seedbank, year {y}
                  <span className="block font-normal text-loam-700">{units.seedUnit}</span>
                </th>
              ))}
              <th scope="col" className={th}>
                Depletion, year {horizon}
                <span className="block font-normal text-loam-700">probability</span>
              </th>
              <th scope="col" className={th}>
                90 % decline
                <span className="block font-normal text-loam-700">median years</span>
              </th>
              <th scope="col" className={th}>
                Cumulative cost
                <span className="block font-normal text-loam-700">{money}</span>
              </th>
              <th scope="col" className={th}>
                Yield loss
                <span className="block font-normal text-loam-700">%, average year</span>
              </th>
              <th scope="col" className={th}>
                NPV
                <span className="block font-normal text-loam-700">{money}</span>
              </th>
              <th scope="col" className={`${th} pr-0`}>
                NPV against No control
                <span className="block font-normal text-loam-700">{money}, mean</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr
                key={r.id}
                className={`border-b border-silt-200 ${r.role === 'baseline' ? 'bg-silt-50' : ''}`}
              >
                <th scope="row" className="py-2 pr-3 text-left align-top font-medium">
                  <span className="flex items-start gap-2">
                    <StyleSwatch style={r.style} className="mt-1" />
                    <Link
                      to={`/w/${workspace.id}/projections/${r.id}`}
                      className="text-humus-900 underline decoration-loam-400 underline-offset-4 hover:text-russet-700"
                    >
                      {r.label}
                    </Link>
                  </span>
                </th>
                {r.seedbank.map((b) => (
                  <td key={b.year} className={td}>
                    <span className="font-semibold">{formatAmount(b.median)}</span>
                    <span className="block text-xs whitespace-nowrap text-loam-700">
                      {formatAmount(b.q05)}–{formatAmount(b.q95)}
                    </span>
                  </td>
                ))}
                <td className={td}>{formatPercent(r.depletionAtHorizon)}</td>
                <td className={td}>
                  {r.declineYears === null ? `> ${horizon}` : r.declineYears}
                  <span className="block text-xs whitespace-nowrap text-loam-700">
                    {formatPercent(r.declineReached)} reach it
                  </span>
                </td>
                <td className={td}>{formatMoney(r.cumulativeCost)}</td>
                <td className={td}>{r.yieldLossPercent.toFixed(1)} %</td>
                <td className={td}>
                  <span className="font-semibold">{formatMoney(r.npv.median)}</span>
                  <span className="block text-xs whitespace-nowrap text-loam-700">
                    {formatMoney(r.npv.q05)}–{formatMoney(r.npv.q95)}
                  </span>
                </td>
                <td className={`${td} pr-0 font-semibold`}>
                  {r.role === 'baseline' ? (
                    <span className="font-normal text-loam-700">reference</span>
                  ) : r.npvVsNoControl === null ? (
                    <span className="font-normal text-loam-700">No control still running</span>
                  ) : (
                    formatSignedMoney(r.npvVsNoControl)
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
