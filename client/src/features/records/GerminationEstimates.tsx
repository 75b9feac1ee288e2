import type { FieldEstimates } from '../../../../shared/api/records';
import { ChartFrame } from '../../shared/charts/ChartFrame';
import { AdoptCell, AdoptPanelFor, type AdoptSlot } from './AdoptCell';
import { fmt, useRecordUnits } from './format';
import { GerminationCurves } from './GerminationCurves';
import { TableScroll, td, tdLeft, th, thLeft } from './tables';

type Test = FieldEstimates['germination'][number];

/** One germination test: final fraction and T50 per temperature, the best temperature, and the curves. */
export function GerminationEstimates({ test, adopt }: { test: Test; adopt?: AdoptSlot }) {
  const units = useRecordUnits();
  const temperature = (c: number) => `${fmt(units.temperature(c))} ${units.degrees}`;
  if (test.problem) return <p className="text-sm font-medium text-danger-700">{test.problem}</p>;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-loam-700">
        {test.best
          ? `Best temperature tested: ${temperature(test.best.temperatureC)}${
              test.best.tiedTemperaturesC.length > 1
                ? ` (tied in final fraction with ${test.best.tiedTemperaturesC
                    .filter((t) => t !== test.best?.temperatureC)
                    .map(temperature)
                    .join(', ')}; the faster one is named)`
                : ''
            }.`
          : 'No seed germinated at any temperature.'}{' '}
        T50 is the time to half of a dish’s final count (Coolbear, Francis & Grierson 1984), averaged over the
        dishes.
      </p>
      <TableScroll label="Germination by temperature">
        <table className="w-full min-w-[48rem] border-collapse text-sm">
          <caption className="sr-only">
            Final germination fraction and T50 per temperature, with 95 % intervals
          </caption>
          <thead>
            <tr className="border-b-2 border-humus-900">
              <th scope="col" className={thLeft}>
                Temperature
                <span className="block font-normal text-loam-700">{units.degrees}</span>
              </th>
              <th scope="col" className={th}>
                Dishes
              </th>
              <th scope="col" className={th}>
                Germinated
                <span className="block font-normal text-loam-700">of seeds</span>
              </th>
              <th scope="col" className={th}>
                Final fraction
              </th>
              <th scope="col" className={th}>
                95 % interval
                <span className="block font-normal text-loam-700">Wilson</span>
              </th>
              <th scope="col" className={th}>
                T50
                <span className="block font-normal text-loam-700">days, 95 % interval</span>
              </th>
              {adopt ? (
                <th scope="col" className={th}>
                  <span className="sr-only">Adopt</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {test.temperatures.map((t) => (
              <tr
                key={t.temperatureC}
                className={`border-b border-silt-200 ${test.best?.temperatureC === t.temperatureC ? 'bg-sprout-100/50' : ''}`}
              >
                <th scope="row" className={`${tdLeft} font-medium`}>
                  {temperature(t.temperatureC)}
                  {test.best?.temperatureC === t.temperatureC ? (
                    <span className="ml-2 text-xs font-semibold text-sprout-800 uppercase">best</span>
                  ) : null}
                </th>
                <td className={td}>{t.tests}</td>
                <td className={td}>
                  {t.fraction.successes} of {t.fraction.trials}
                </td>
                <td className={td}>{t.fraction.estimate.toFixed(3)}</td>
                <td className={td}>
                  {t.fraction.lower.toFixed(3)}–{t.fraction.upper.toFixed(3)}
                </td>
                <td className={td}>
                  {t.t50Days
                    ? `${t.t50Days.meanDays.toFixed(1)}${t.t50Days.lower !== null && t.t50Days.upper !== null ? ` (${t.t50Days.lower.toFixed(1)}–${t.t50Days.upper.toFixed(1)})` : ''}`
                    : '—'}
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
      <AdoptPanelFor keys={test.temperatures.map((t) => t.adopt.key)} slot={adopt} />
      <ChartFrame
        title="Germination curves by temperature"
        lead="Cumulative fraction germinated in each dish; one line style per temperature."
        exportSubtitle={test.upload.filename}
        filename={`germination-${test.upload.filename.replace(/\.[^.]+$/, '')}`}
      >
        <GerminationCurves
          title="Germination curves by temperature"
          summary={`Cumulative germination of ${test.tests.length} dishes at ${test.temperatures.map((t) => temperature(t.temperatureC)).join(', ')}.`}
          dishes={test.tests.map((d) => ({
            testId: d.testId,
            temperatureC: d.temperatureC,
            points: d.curve,
          }))}
          temperatureLabel={temperature}
        />
      </ChartFrame>
    </div>
  );
}
