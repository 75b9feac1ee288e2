// What a finished projection stores — the CLI's result (summary and mean field) plus the
// matrix view of its program — and the one function that makes it, used by the worker
// pool and by the demo seed alike.
import type { ProjectionResult } from '../../models/projection/run';
import type { MatrixAnalysis } from '../../models/matrix/analysis';
import { summarise } from '../../models/projection/summarise';
import { projectMeanField } from '../../models/projection/mean-field';
import { seriesNames, type ReplicateBlock } from '../../models/projection/trajectories';
import { analyzeLinearisedCycle } from '../../models/lifecycle/matrix-form';
import type { Scenario } from '../../models/scenario/types';

export type ProjectionOutcome = ProjectionResult & {
  matrix: ({ ok: true; stages: string[] } & MatrixAnalysis) | { ok: false; reason: string };
};

/** The matrix view can be undefined (e.g. a cycle with no loop); the projection still stands. */
function matrixView(scenario: Scenario): ProjectionOutcome['matrix'] {
  try {
    const { stages, analysis } = analyzeLinearisedCycle(scenario);
    return { ok: true, stages, ...analysis };
  } catch (err) {
    return { ok: false, reason: (err as Error).message };
  }
}

export function finishProjection(scenario: Scenario, block: ReplicateBlock): ProjectionOutcome {
  const mf = projectMeanField(scenario);
  return {
    summary: summarise(scenario, block),
    meanField: Object.fromEntries(
      seriesNames.map((n) => [n, Array.from(mf.series[n])]),
    ) as ProjectionOutcome['meanField'],
    matrix: matrixView(scenario),
  };
}
