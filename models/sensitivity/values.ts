// From design coordinates to parameter values.
import type { SweepParameter } from './design';

/**
 * The value at unit coordinate u ∈ [0, 1): min + u·(max − min). A whole-number parameter takes
 * min + ⌊u·(max − min + 1)⌋ instead, so each of its integers gets an equal share of [0, 1);
 * rounding min + u·(max − min) would give min and max half the share of the others. The unit
 * strata of a Latin hypercube then map onto whole values as evenly as the counts allow.
 */
export function valueAt(param: SweepParameter, u: number): number {
  if (param.integer) return Math.min(param.max, param.min + Math.floor(u * (param.max - param.min + 1)));
  return param.min + u * (param.max - param.min);
}

/**
 * The `levels` evenly spaced values of a factorial grid, min first and max last; a whole-number
 * parameter's are rounded to the nearest integer.
 */
export function factorialLevels(param: SweepParameter, levels: number): number[] {
  return Array.from({ length: levels }, (_, l) => {
    const exact = l === levels - 1 ? param.max : param.min + ((param.max - param.min) * l) / (levels - 1);
    return param.integer ? Math.round(exact) : exact;
  });
}
