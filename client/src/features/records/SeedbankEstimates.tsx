import type { FieldEstimates } from '../../../../shared/api/records';
import { ChartFrame } from '../../shared/charts/ChartFrame';
import { measureStyles, strategyStyles } from '../../shared/charts/palette';
import { AdoptCell, AdoptPanelFor, type AdoptSlot } from './AdoptCell';
import { fmt, percent, useRecordUnits } from './format';
import { IntervalBars } from './IntervalBars';
import { TableScroll, td, th, thLeft, tdLeft } from './tables';

/** Layers in their horizon colours: the first (shallow) in loam, the next in clay, further ones in seed tones. */
const layerColors = [
  measureStyles.seedbankShallow.color,
  measureStyles.seedbankDeep.color,
  ...strategyStyles.slice(1).map((s) => s.color),
];

const methodNames = { 'exact-poisson': 'exact Poisson', 'negative-binomial': 'negative binomial' } as const;

/** Seeds per m² (or ft²) per layer and year with intervals, the chart by layer, and seed decay over the years. */
export function SeedbankEstimates({
  seedbank,
  adopt,
}: {
  seedbank: FieldEstimates['seedbank'];
  adopt?: AdoptSlot;
}) {
  const units = useRecordUnits();
  const unit = `seeds/${units.per}`;
  const layerNames = [...new Set(seedbank.years.flatMap((y) => y.layers.map((l) => l.layer)))];
  const color = (layer: string) => layerColors[layerNames.indexOf(layer) % layerColors.length];
  const bars = seedbank.years.flatMap((y) =>
    y.layers.map((l) => ({
      key: `${y.year}-${l.layer}`,
      group: String(y.year),
      label: l.layer,
      value: units.density(l.perM2.estimate),
      lower: units.density(l.perM2.lower),
      upper: units.density(l.perM2.upper),
      color: color(l.layer),
    })),
  );
  return (
    <div className="flex flex-col gap-5">
      {seedbank.problem ? <p className="text-sm font-medium text-danger-700">{seedbank.problem}</p> : null}
      <TableScroll label="Seedbank density by layer">
        <table className="w-full min-w-[52rem] border-collapse text-sm">
          <caption className="sr-only">
            Seedbank density per layer and year, {unit}, with 95 % intervals
          </caption>
          <thead>
            <tr className="border-b-2 border-humus-900">
              <th scope="col" className={thLeft}>
                Year and layer
              </th>
              <th scope="col" className={th}>
                Cores
              </th>
              <th scope="col" className={th}>
                Counted
                <span className="block font-normal text-loam-700">seeds</span>
              </th>
              <th scope="col" className={th}>
                Density
                <span className="block font-normal text-loam-700">{unit}</span>
              </th>
              <th scope="col" className={th}>
                95 % interval
                <span className="block font-normal text-loam-700">{unit}</span>
              </th>
              <th scope="col" className={`${thLeft} pl-3`}>
                Interval method, and why
              </th>
            </tr>
          </thead>
          <tbody>
            {seedbank.years.map((y) => (
              <YearRows key={y.year} year={y} unit={unit} adopt={adopt} />
            ))}
          </tbody>
        </table>
      </TableScroll>
      <AdoptPanelFor keys={seedbank.years.map((y) => y.adopt.key)} slot={adopt} />
      {bars.length > 0 ? (
        <ChartFrame
          title="Seedbank by layer"
          lead={`Density per layer and sampling year, ${unit}: the bar and the figure are the estimate, the whisker its 95 % interval.`}
          exportSubtitle={unit}
        >
          <IntervalBars
            title="Seedbank by layer"
            summary={`Seedbank density per layer for ${seedbank.years.map((y) => y.year).join(', ')}, in ${unit}, with 95 % intervals.`}
            bars={bars}
            xLabel={unit}
            format={(v) => fmt(v)}
          />
        </ChartFrame>
      ) : null}
      {seedbank.decay.length > 0 ? (
        <div className="flex flex-col gap-2">
          <h4 className="text-lg font-semibold">Seed decay from the yearly densities</h4>
          <p className="max-w-prose text-sm text-loam-700">
            Log-linear regression of ln density on year: the loss per year is 1 − e<sup>slope</sup>, with the
            slope’s t interval. A field that also receives seed rain or loses seedlings to emergence shows the
            net change, not decay alone.
          </p>
          <TableScroll label="Seed decay">
            <table className="w-full min-w-[48rem] border-collapse text-sm">
              <caption className="sr-only">Seed decay per layer from the seedbank time series</caption>
              <thead>
                <tr className="border-b-2 border-humus-900">
                  <th scope="col" className={thLeft}>
                    Layer
                  </th>
                  <th scope="col" className={th}>
                    Years
                  </th>
                  <th scope="col" className={th}>
                    Loss per year
                  </th>
                  <th scope="col" className={th}>
                    95 % interval
                  </th>
                  <th scope="col" className={th}>
                    Half-life
                    <span className="block font-normal text-loam-700">years</span>
                  </th>
                  <th scope="col" className={th}>
                    R²
                  </th>
                  {adopt ? (
                    <th scope="col" className={th}>
                      <span className="sr-only">Adopt</span>
                    </th>
                  ) : null}
                </tr>
              </thead>
              <tbody>
                {seedbank.decay.map((d) => (
                  <tr key={d.layer} className="border-b border-silt-200">
                    <th scope="row" className={`${tdLeft} font-medium`}>
                      {d.layer}
                    </th>
                    <td className={td}>{d.observations.map((o) => o.year).join(', ')}</td>
                    {d.result ? (
                      <>
                        <td className={td}>{percent(d.result.decayRate.estimate)}</td>
                        <td className={td}>
                          {percent(d.result.decayRate.lower)} to {percent(d.result.decayRate.upper)}
                        </td>
                        <td className={td}>
                          {d.result.halfLifeYears === null ? '—' : fmt(d.result.halfLifeYears)}
                        </td>
                        <td className={td}>
                          {d.result.rSquared === null ? '—' : d.result.rSquared.toFixed(3)}
                        </td>
                      </>
                    ) : (
                      <td colSpan={4} className={`${tdLeft} pl-3 text-loam-700`}>
                        {d.problem}
                      </td>
                    )}
                    {adopt ? (
                      <td className={td}>{d.adopt ? <AdoptCell estimate={d.adopt} slot={adopt} /> : null}</td>
                    ) : null}
                  </tr>
                ))}
              </tbody>
            </table>
          </TableScroll>
          <AdoptPanelFor keys={seedbank.decay.flatMap((d) => (d.adopt ? [d.adopt.key] : []))} slot={adopt} />
        </div>
      ) : null}
    </div>
  );
}

function YearRows({
  year,
  unit,
  adopt,
}: {
  year: FieldEstimates['seedbank']['years'][number];
  unit: string;
  adopt?: AdoptSlot;
}) {
  const units = useRecordUnits();
  return (
    <>
      <tr className="border-b border-silt-300 bg-silt-50">
        <th scope="rowgroup" colSpan={5} className={`${tdLeft} font-semibold`}>
          {year.year}
          <span className="ml-2 font-normal text-loam-700">
            {year.method === 'seedlings-emerged'
              ? 'seedlings emerged from the samples'
              : year.method === 'mixed'
                ? 'seeds counted and seedlings emerged (mixed methods)'
                : 'seeds extracted and counted'}
            {' · '}
            {year.sources.map((s) => s.filename).join(', ')}
          </span>
        </th>
        <td className={`${tdLeft} pl-3`}>
          {adopt ? <AdoptCell estimate={year.adopt} slot={adopt} /> : null}
        </td>
      </tr>
      {year.layers.map((l) => (
        <tr key={l.layer} className="border-b border-silt-200">
          <th scope="row" className={`${tdLeft} pl-4 font-medium`}>
            {l.layer}
          </th>
          <td className={td}>{l.cores}</td>
          <td className={td}>{l.count.toLocaleString('en-US')}</td>
          <td className={td}>
            {fmt(units.density(l.perM2.estimate))}
            <span className="sr-only"> {unit}</span>
          </td>
          <td className={`${td} whitespace-nowrap`}>
            {fmt(units.density(l.perM2.lower))}–{fmt(units.density(l.perM2.upper))}
          </td>
          <td className={`${tdLeft} pl-3`}>
            <span className="font-medium">{methodNames[l.method]}</span>
            <span className="block text-loam-700">{l.reason}</span>
          </td>
        </tr>
      ))}
    </>
  );
}
