// The analysis each design was made for, on the points finished so far, plus the scatter of
// the outcome against every parameter. The maths is models/sensitivity's; this file decides
// which points it may use: one-at-a-time and factorial need every point, a Latin hypercube
// any finished subset (a random sample still), Sobol' whole leading blocks of k + 2 points.
import { mainEffects } from '../../models/sensitivity/factorial';
import { prcc } from '../../models/sensitivity/prcc';
import { sobolIndices } from '../../models/sensitivity/sobol';
import { tornado } from '../../models/sensitivity/tornado';
import type { SweepAnalysis } from '../../shared/api/sweeps';
import type { OutcomeKind } from '../../shared/sweeps/outcomes';
import type { SweepDefinition } from '../db/schema-sweeps';

export type ResultPoint = {
  index: number;
  inputs: number[];
  outcomes: Partial<Record<OutcomeKind, number>> | null;
  error: string | null;
};

/** Enough dots to see a relation; more would only slow the page. */
const SCATTER_MAX = 4000;

const finiteOrNull = (x: number) => (Number.isFinite(x) ? x : null);

export function analyseSweep(
  definition: SweepDefinition,
  totalPoints: number,
  results: readonly ResultPoint[],
  outcome: OutcomeKind,
): SweepAnalysis {
  const params = definition.parameters;
  const k = params.length;
  const y = new Map<number, number>();
  const failed = new Map<number, string>();
  for (const r of results) {
    const v = r.outcomes?.[outcome];
    if (v !== undefined && Number.isFinite(v)) y.set(r.index, v);
    else failed.set(r.index, r.error ?? 'no value');
  }
  const sorted = [...results].filter((r) => y.has(r.index)).sort((a, b) => a.index - b.index);
  const step = Math.max(1, Math.ceil(sorted.length / SCATTER_MAX));
  const shown = sorted.filter((_, i) => i % step === 0);
  const out: SweepAnalysis = {
    outcome,
    pointsUsed: 0,
    totalPoints,
    pending: null,
    tornado: null,
    prcc: null,
    sobol: null,
    mainEffects: null,
    scatter: {
      index: shown.map((r) => r.index),
      inputs: params.map((_, j) => shown.map((r) => r.inputs[j])),
      outcome: shown.map((r) => y.get(r.index)!),
      thinned: step > 1,
    },
  };

  /** Every point's value, or why not: the first failed point, else how many are still to come. */
  const everyPoint = (): number[] | null => {
    const firstFailed = [...failed.keys()].sort((a, b) => a - b)[0];
    if (firstFailed !== undefined) {
      out.pending = `Point ${firstFailed} has no value (${failed.get(firstFailed)}), so this design’s analysis cannot be made`;
      return null;
    }
    if (y.size < totalPoints) {
      out.pending = `The analysis appears when all ${totalPoints} points are done (${y.size} so far)`;
      return null;
    }
    return Array.from({ length: totalPoints }, (_, i) => y.get(i)!);
  };

  switch (definition.design.kind) {
    case 'one-at-a-time': {
      const ys = everyPoint();
      if (ys) {
        out.tornado = tornado(params, ys);
        out.pointsUsed = ys.length;
      }
      break;
    }
    case 'factorial': {
      const ys = everyPoint();
      if (ys) {
        out.mainEffects = mainEffects(params, definition.design.levels, ys);
        out.pointsUsed = ys.length;
      }
      break;
    }
    case 'latin-hypercube': {
      if (sorted.length < k + 2) {
        out.pending = `PRCC needs at least ${k + 2} points with a value (${sorted.length} so far)`;
        break;
      }
      const entries = prcc(
        params,
        sorted.map((r) => r.inputs),
        sorted.map((r) => y.get(r.index)!),
      );
      out.prcc = entries.map((e) => ({
        path: e.path,
        coefficient: finiteOrNull(e.coefficient),
        pValue: finiteOrNull(e.pValue),
        degreesOfFreedom: e.degreesOfFreedom,
      }));
      out.pointsUsed = sorted.length;
      if (sorted.length < totalPoints) {
        out.pending =
          failed.size > 0 && y.size + failed.size === totalPoints
            ? `On the ${sorted.length} points with a value; ${failed.size} failed`
            : `On the ${sorted.length} of ${totalPoints} points done so far`;
      }
      break;
    }
    case 'sobol': {
      const width = k + 2;
      let blocks = 0;
      while (blocks * width + width <= totalPoints) {
        let whole = true;
        for (let i = blocks * width; i < (blocks + 1) * width; i++) if (!y.has(i)) whole = false;
        if (!whole) break;
        blocks++;
      }
      // The block that stops the run of whole blocks: a failed point ends it for good.
      let stop = '';
      for (let i = blocks * width; i < Math.min(totalPoints, (blocks + 1) * width); i++) {
        if (failed.has(i)) {
          stop = `; point ${i} of the next block has no value (${failed.get(i)})`;
          break;
        }
      }
      if (blocks < 2) {
        out.pending = `Sobol’ indices need at least 2 complete blocks of ${width} points (${blocks} so far${stop})`;
        break;
      }
      const ys = Array.from({ length: blocks * width }, (_, i) => y.get(i)!);
      const analysis = sobolIndices(params, ys, definition.seed);
      const estimate = (e: { value: number; low: number; high: number }) => ({
        value: finiteOrNull(e.value),
        low: finiteOrNull(e.low),
        high: finiteOrNull(e.high),
      });
      out.sobol = {
        baseSamples: analysis.baseSamples,
        confidence: analysis.confidence,
        bootstrapDraws: analysis.bootstrapDraws,
        variance: analysis.variance,
        indices: analysis.indices.map((s) => ({
          path: s.path,
          first: estimate(s.first),
          total: estimate(s.total),
        })),
      };
      out.pointsUsed = ys.length;
      const allBlocks = totalPoints / width;
      if (blocks < allBlocks) {
        out.pending = stop
          ? `On the first ${blocks} of ${allBlocks} base samples (blocks of ${width} points)${stop}`
          : `On the first ${blocks} of ${allBlocks} base samples (blocks of ${width} points) complete so far`;
      }
      break;
    }
  }
  return out;
}
