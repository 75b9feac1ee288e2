// "Replay with chance": the lesson's scenarios, built from the slider values exactly as the
// page builds them, run as seeded replicates in the projection workers; the answer is the
// quantile band of each run for the page to lay over its deterministic lines.
import {
  checkSliderValues,
  type LessonDefinition,
  type ReplayBody,
  type ReplayResponse,
} from '../../shared/api/lessons';
import { lessonRuns } from '../../shared/lessons/runs';
import type { SeriesSummary } from '../../models/projection/summarise';
import type { SpeciesProfile } from '../../models/scenario/types';
import type { ProjectionPool } from '../projections/pool';
import { invalid } from './errors';

const band = (s: SeriesSummary) => ({ q05: s.q05, q25: s.q25, q50: s.q50, q75: s.q75, q95: s.q95 });

export async function runReplay(
  pool: ProjectionPool,
  definition: LessonDefinition,
  profile: SpeciesProfile | null,
  body: ReplayBody,
): Promise<ReplayResponse> {
  const fields = checkSliderValues(definition, body.values);
  if (Object.keys(fields).length) {
    const [first] = Object.entries(fields);
    throw invalid(`Invalid body: ${first[0]}: ${first[1]}`, fields);
  }
  // Replicates and horizon come from the saved lesson (at most 200 and 60), never from the request.
  const runs = lessonRuns(definition, profile, body.values, {
    replicates: definition.settings.replicates,
    seed: body.seed,
  });
  const outcomes = await Promise.all(runs.map((run) => pool.run(run.scenario)));
  return {
    seed: body.seed,
    replicates: definition.settings.replicates,
    years: outcomes[0].summary.years,
    runs: runs.map((run, i) => ({
      id: run.id,
      label: run.label,
      seedbankTotal: band(outcomes[i].summary.series.seedbankTotal),
      established: band(outcomes[i].summary.series.established),
    })),
  };
}
