// Triangular variates, for quantities known only as min / most likely / max (e.g.
// an efficacy range from trials), by inverting the closed-form CDF.
import type { UniformSource } from './stream';

function invalidTriangular(min: number, mode: number, max: number): never {
  throw new RangeError(`triangular needs finite min <= mode <= max, got ${min}, ${mode}, ${max}`);
}

/** One triangular variate on [min, max] with its peak at mode; min = max returns min. */
export function triangular(src: UniformSource, min: number, mode: number, max: number): number {
  if (!(min > -Infinity && max < Infinity && min <= mode && mode <= max)) invalidTriangular(min, mode, max);
  const width = max - min;
  if (width === 0) return min;
  const u = src.next();
  // The CDF at the mode splits the two quadratic branches.
  const atMode = (mode - min) / width;
  if (u < atMode) return min + Math.sqrt(u * width * (mode - min));
  return max - Math.sqrt((1 - u) * width * (max - mode));
}
