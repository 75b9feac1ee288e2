import type { FieldEstimates } from '../../../../shared/api/records';
import { AdoptCell, AdoptPanelFor, type AdoptSlot } from './AdoptCell';
import { fmt, useRecordUnits } from './format';
import { TableScroll, td, tdLeft, th, thLeft } from './tables';

/** Plants per area by stage and year, and the survival and flowering fractions with binomial intervals. */
export function PlantEstimates({ plants, adopt }: { plants: FieldEstimates['plants']; adopt?: AdoptSlot }) {
  const units = useRecordUnits();
  const unit = `plants/${units.per}`;
  return (
    <div className="flex flex-col gap-5">
      {plants.problem ? <p className="text-sm font-medium text-danger-700">{plants.problem}</p> : null}
      <TableScroll label="Plant density by stage and year">
        <table className="w-full min-w-[40rem] border-collapse text-sm">
          <caption className="sr-only">Plant density by stage and year, {unit}, with 95 % intervals</caption>
          <thead>
            <tr className="border-b-2 border-humus-900">
              <th scope="col" className={thLeft}>
                Year and stage
              </th>
              <th scope="col" className={th}>
                Quadrats
              </th>
              <th scope="col" className={th}>
                Plants counted
              </th>
              <th scope="col" className={th}>
                Density
                <span className="block font-normal text-loam-700">{unit}</span>
              </th>
              <th scope="col" className={th}>
                95 % interval
                <span className="block font-normal text-loam-700">{unit}</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {plants.densities.map((d) => (
              <tr key={`${d.year}-${d.stage}`} className="border-b border-silt-200">
                <th scope="row" className={`${tdLeft} font-medium`}>
                  {d.year} · {d.stage}
                </th>
                <td className={td}>{d.samples}</td>
                <td className={td}>{d.count}</td>
                <td className={td}>{fmt(units.density(d.perM2.estimate))}</td>
                <td className={td} title={d.reason}>
                  {fmt(units.density(d.perM2.lower))}–{fmt(units.density(d.perM2.upper))}
                  <span className="block text-xs text-loam-700">
                    {d.method === 'negative-binomial' ? 'negative binomial' : 'exact Poisson'}
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
      <h4 className="text-lg font-semibold">Annual transitions</h4>
      <TableScroll label="Transition rates">
        <table className="w-full min-w-[48rem] border-collapse text-sm">
          <caption className="sr-only">
            Transition rates from successive plant counts with Wilson 95 % intervals
          </caption>
          <thead>
            <tr className="border-b-2 border-humus-900">
              <th scope="col" className={thLeft}>
                Rate
              </th>
              <th scope="col" className={th}>
                Plants
                <span className="block font-normal text-loam-700">of</span>
              </th>
              <th scope="col" className={th}>
                Estimate
                <span className="block font-normal text-loam-700">fraction</span>
              </th>
              <th scope="col" className={th}>
                95 % interval
                <span className="block font-normal text-loam-700">Wilson</span>
              </th>
              <th scope="col" className={th}>
                By year
              </th>
              {adopt ? (
                <th scope="col" className={th}>
                  <span className="sr-only">Adopt</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {plants.transitions.map((t) => (
              <tr key={t.key} className="border-b border-silt-200">
                <th scope="row" className={`${tdLeft} font-medium`}>
                  {t.label}
                  <span className="block max-w-md font-normal text-loam-700">{t.definition}</span>
                </th>
                {t.pooled ? (
                  <>
                    <td className={td}>
                      {t.pooled.successes} of {t.pooled.trials}
                    </td>
                    <td className={td}>{t.pooled.estimate.toFixed(3)}</td>
                    <td className={td}>
                      {t.pooled.lower.toFixed(3)}–{t.pooled.upper.toFixed(3)}
                    </td>
                    <td className={td}>
                      {t.byYear.map((y) => (
                        <span key={y.year} className="block whitespace-nowrap">
                          {y.year}: {y.rate.estimate.toFixed(2)} ({y.rate.lower.toFixed(2)}–
                          {y.rate.upper.toFixed(2)})
                        </span>
                      ))}
                    </td>
                  </>
                ) : (
                  <td colSpan={4} className={`${tdLeft} pl-3 text-loam-700`}>
                    {t.problem}
                  </td>
                )}
                {adopt ? (
                  <td className={td}>{t.adopt ? <AdoptCell estimate={t.adopt} slot={adopt} /> : null}</td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
      <AdoptPanelFor keys={plants.transitions.flatMap((t) => (t.adopt ? [t.adopt.key] : []))} slot={adopt} />
    </div>
  );
}
