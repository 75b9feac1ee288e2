// One point of a sweep: the base scenario with the point's parameter values set at their
// paths, validated as any scenario is, run for the sweep's replicates with the point's own
// seed, and reduced to the chosen outcomes. The server's workers and the command line both
// call this, so the same definition and seed give the same numbers everywhere.
import type { Scenario } from '../../models/scenario/types';
import { runReplicates } from '../../models/projection/replicates';
import { pointSeed } from '../../models/sensitivity/point-seed';
import { issueText, parseScenario } from '../scenario/parse';
import { pointOutcomes, type OutcomeKind } from './outcomes';
import { withValues } from './paths';

/** What every point of a sweep shares. */
export interface SweepRun {
  base: Scenario;
  paths: readonly string[];
  outcomes: readonly OutcomeKind[];
  outcomeYear: number;
  replicatesPerPoint: number;
  /** The sweep seed; point i draws from pointSeed(seed, i). */
  seed: number;
}

export type PointResult =
  { ok: true; outcomes: Partial<Record<OutcomeKind, number>> } | { ok: false; error: string };

export function evaluatePoint(run: SweepRun, index: number, values: readonly number[]): PointResult {
  const candidate = withValues(run.base, run.paths, values);
  candidate.replicates = run.replicatesPerPoint;
  // The scenario schema takes 32-bit seeds; the point's 53-bit seed is set after validation.
  candidate.seed = run.seed;
  const parsed = parseScenario(candidate);
  if (!parsed.ok) return { ok: false, error: parsed.issues.map(issueText).join('; ') };
  const scenario: Scenario = { ...parsed.scenario, seed: pointSeed(run.seed, index) };
  try {
    const block = runReplicates(scenario, 0, scenario.replicates);
    const outcomes = pointOutcomes(scenario, block, run.outcomes, run.outcomeYear);
    const bad = Object.entries(outcomes).find(([, v]) => !Number.isFinite(v));
    if (bad) return { ok: false, error: `${bad[0]} is not a finite number (${bad[1]})` };
    return { ok: true, outcomes };
  } catch (error) {
    // e.g. counts that outgrow exact integers: the point fails, the sweep goes on.
    return { ok: false, error: (error as Error).message };
  }
}
