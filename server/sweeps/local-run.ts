// A whole sweep in this process's worker threads, without a database: the command line's
// `sim sweep` and the benchmark. It plans, places and computes points with exactly the
// functions the server's queue uses, so the same definition and seed give the same points.
import { z } from 'zod';
import type { Scenario } from '../../models/scenario/types';
import { designPoints } from '../../models/sensitivity/points';
import type { SweepPointView } from '../../shared/api/sweeps';
import { planSweep, type SweepPlan, type SweepProblems } from '../../shared/sweeps/plan';
import { sweepSpecShape, type SweepSpec } from '../../shared/sweeps/schema';
import { createPointPool } from './point-pool';

/** A sweep file: a full base scenario in place of the server's scenario and strategy ids. */
export const sweepFileSchema = z.strictObject({
  name: z.string().max(120).optional(),
  scenario: z.unknown(),
  ...sweepSpecShape,
});

export type LocalSweepResult = {
  plan: SweepPlan;
  points: SweepPointView[];
};

export type LocalSweep = { ok: true; result: LocalSweepResult } | { ok: false; problems: SweepProblems };

export async function runLocalSweep(base: Scenario, spec: SweepSpec, threads: number): Promise<LocalSweep> {
  const planned = planSweep(base, spec);
  if (!planned.ok) return planned;
  const { plan } = planned;
  const rows = designPoints(plan.parameters, spec.design, spec.seed);
  const pool = createPointPool({ threads });
  try {
    const computed = await pool.evaluate(
      {
        base,
        paths: plan.parameters.map((p) => p.path),
        outcomes: spec.outcomes,
        outcomeYear: spec.outcomeYear,
        replicatesPerPoint: spec.replicatesPerPoint,
        seed: spec.seed,
      },
      rows.map((values, index) => ({ index, values })),
    );
    const points = computed!.map((c) => ({
      index: c.index,
      inputs: c.values,
      outcomes: c.result.ok ? (c.result.outcomes as Record<string, number>) : null,
      error: c.result.ok ? null : c.result.error,
    }));
    return { ok: true, result: { plan, points } };
  } finally {
    await pool.destroy();
  }
}
