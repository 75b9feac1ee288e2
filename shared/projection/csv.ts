// A projection summary as tidy CSV: one row per year (0 = first census), one column per
// statistic, the unit in each header, ASCII only so R and spreadsheets read it as is.
import type { ProjectionSummary, SeriesSummary } from '../../models/projection/summarise';
import { seriesNames } from '../../models/projection/trajectories';

const STATISTICS = ['mean', 'sd', 'q05', 'q25', 'q50', 'q75', 'q95'] as const;

const asciiUnit = (unit: string) => unit.replace(/²/g, '2');

const cell = (value: number | null): string =>
  value === null || !Number.isFinite(value) ? '' : String(value);

export function summaryToCsv(summary: ProjectionSummary): string {
  const columns: { header: string; value: (t: number) => number | null }[] = [
    { header: 'year', value: (t) => t },
  ];
  const add = (name: string, s: SeriesSummary) => {
    for (const stat of STATISTICS)
      columns.push({ header: `${name}_${stat} (${asciiUnit(s.unit)})`, value: (t) => s[stat][t] });
  };
  for (const name of seriesNames) add(name, summary.series[name]);
  columns.push({ header: 'depletionProbability (fraction)', value: (t) => summary.depletionProbability[t] });
  add('yieldLoss', summary.economics.yieldLossPercent);
  add('netValuePerHa', summary.economics.netValuePerHa);
  add('cumulativeCostPerHa', summary.economics.cumulativeCostPerHa);
  const lines = [columns.map((c) => c.header).join(',')];
  for (const t of summary.years) lines.push(columns.map((c) => cell(c.value(t))).join(','));
  return `${lines.join('\n')}\n`;
}
