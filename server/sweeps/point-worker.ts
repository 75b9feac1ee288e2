// A piscina worker thread of the sweep pool: computes one design point.
import { evaluatePoint, type PointResult, type SweepRun } from '../../shared/sweeps/evaluate';

export type PointTask = { run: SweepRun; index: number; values: number[] };

export default function handle(task: PointTask): PointResult {
  return evaluatePoint(task.run, task.index, task.values);
}
