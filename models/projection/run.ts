// One call for scripts and the CLI: all replicates in this thread, their summary, and the
// mean-field trajectory beside it. The server's worker pool instead runs blocks of
// replicates with runReplicates, merges them and calls summarise — the same numbers.
import type { Scenario } from '../scenario/types';
import { projectMeanField } from './mean-field';
import { runReplicates } from './replicates';
import { summarise } from './summarise';
import type { ProjectionSummary } from './summarise';
import { seriesNames } from './trajectories';
import type { SeriesName } from './trajectories';

export interface ProjectionResult {
  readonly summary: ProjectionSummary;
  /** The deterministic mean-field projection, per year. */
  readonly meanField: Record<SeriesName, number[]>;
}

export function runProjection(scenario: Scenario): ProjectionResult {
  const block = runReplicates(scenario, 0, scenario.replicates);
  const mf = projectMeanField(scenario);
  const meanField = {} as Record<SeriesName, number[]>;
  for (const name of seriesNames) meanField[name] = Array.from(mf.series[name]);
  return { summary: summarise(scenario, block), meanField };
}
