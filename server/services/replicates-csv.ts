import { seriesNames, seriesUnits } from '../../models/projection/trajectories';
import type { Scenario } from '../../models/scenario/types';
import type { ProjectionPool } from '../projections/pool';
import { invalid } from './errors';

const MAX_ROWS = 1_000_000;

/**
 * Per-replicate trajectories as tidy CSV (one row per replicate and year). Projections
 * are deterministic, so the rows are re-computed from the frozen input and seed rather
 * than stored.
 */
export async function replicatesCsv(pool: ProjectionPool, scenario: Scenario) {
  const rows = scenario.replicates * (scenario.horizonYears + 1);
  if (rows > MAX_ROWS) {
    throw invalid(
      `That export would have ${rows.toLocaleString('en')} rows; the limit is ${MAX_ROWS.toLocaleString('en')}. Use the CLI for larger ones.`,
    );
  }
  const block = await pool.replicates(scenario);
  const H = block.years;
  const header = ['replicate', 'year', ...seriesNames.map((n) => `${n} (${seriesUnits[n]})`)].join(',');
  const lines = [`# seed ${scenario.seed}; strategy ${JSON.stringify(scenario.strategy.name)}`, header];
  for (let r = 0; r < block.toReplicate - block.fromReplicate; r++) {
    for (let t = 0; t <= H; t++) {
      const i = r * (H + 1) + t;
      lines.push([block.fromReplicate + r, t, ...seriesNames.map((n) => block.series[n][i])].join(','));
    }
  }
  return lines.join('\n') + '\n';
}
