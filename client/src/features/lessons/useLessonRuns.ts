import { useMemo } from 'react';
import { projectMeanField } from '../../../../models/projection/mean-field';
import type { ReplicateBlock } from '../../../../models/projection/trajectories';
import type { LessonDefinition } from '../../../../shared/api/lessons';
import { lessonRuns, type LessonRun, type SliderValues } from '../../../../shared/lessons/runs';
import type { SpeciesProfile } from '../../../../models/scenario/types';

export type ComputedRun = LessonRun & { meanField: ReplicateBlock['series'] };

/**
 * The lesson's runs at the current slider values, projected in the browser with the
 * engine's deterministic mean field: the same scenarios the server replays with chance.
 */
export function useLessonRuns(
  definition: LessonDefinition,
  profile: SpeciesProfile | null,
  values: SliderValues,
): ComputedRun[] {
  return useMemo(
    () =>
      lessonRuns(definition, profile, values).map((run) => ({
        ...run,
        meanField: projectMeanField(run.scenario).series,
      })),
    [definition, profile, values],
  );
}

/** Years 0..H, the x axis of every lesson chart. */
export const yearsOf = (horizonYears: number) => Array.from({ length: horizonYears + 1 }, (_, t) => t);
