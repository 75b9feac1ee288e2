// Checks of a sweep definition, as sentences naming the parameter or design field at fault, so
// the server can answer 400 with them and the engine can refuse the same definitions.
import type { SweepDesign, SweepParameter } from './design';
import { SOBOL_MAX_PARAMETERS } from './sobol-sequence';

/** Every problem found (empty when the definition is usable). */
export function designProblems(params: readonly SweepParameter[], design: SweepDesign): string[] {
  const problems: string[] = [];
  if (params.length === 0) problems.push('a sweep must vary at least one parameter');
  const seen = new Set<string>();
  for (const p of params) {
    const name = `parameter "${p.path}"`;
    if (p.path.length === 0) problems.push('a parameter path must not be empty');
    if (seen.has(p.path)) problems.push(`${name} is listed twice`);
    seen.add(p.path);
    if (![p.min, p.max, p.base].every(Number.isFinite)) {
      problems.push(`${name}: min, max and base must be finite numbers`);
      continue;
    }
    // A zero-width range would add points that differ in nothing.
    if (!(p.min < p.max)) problems.push(`${name}: min (${p.min}) must be less than max (${p.max})`);
    if (p.base < p.min || p.base > p.max) {
      problems.push(`${name}: base (${p.base}) must lie within [${p.min}, ${p.max}]`);
    }
    if (p.integer && ![p.min, p.max, p.base].every(Number.isInteger)) {
      problems.push(`${name} is a whole number: min, max and base must be integers`);
    }
  }
  problems.push(...designFieldProblems(params, design));
  return problems;
}

function designFieldProblems(params: readonly SweepParameter[], design: SweepDesign): string[] {
  switch (design.kind) {
    case 'one-at-a-time':
      return [];
    case 'factorial': {
      if (!Number.isInteger(design.levels) || design.levels < 2) {
        return [`factorial levels must be an integer of at least 2, got ${design.levels}`];
      }
      // More levels than whole numbers in the range would round to repeated grid points.
      return params
        .filter((p) => p.integer && Number.isInteger(p.min) && Number.isInteger(p.max))
        .filter((p) => p.max - p.min + 1 < design.levels)
        .map(
          (p) =>
            `parameter "${p.path}" has only ${p.max - p.min + 1} whole values, fewer than ${design.levels} levels`,
        );
    }
    case 'latin-hypercube':
      return Number.isInteger(design.points) && design.points >= 1
        ? []
        : [`latin hypercube points must be a positive integer, got ${design.points}`];
    case 'sobol': {
      const problems: string[] = [];
      // Two base rows are the fewest for which a variance, and so an index, exists.
      if (!Number.isInteger(design.baseSamples) || design.baseSamples < 2) {
        problems.push(`sobol base samples must be an integer of at least 2, got ${design.baseSamples}`);
      } else if (design.baseSamples > 2 ** 32) {
        problems.push(`sobol base samples must be at most 2^32, got ${design.baseSamples}`);
      }
      if (params.length > SOBOL_MAX_PARAMETERS) {
        problems.push(
          `a sobol design varies at most ${SOBOL_MAX_PARAMETERS} parameters, got ${params.length}`,
        );
      }
      return problems;
    }
  }
}

/** Throws a RangeError listing every problem, for callers that must not go on with a bad definition. */
export function assertValidDesign(params: readonly SweepParameter[], design: SweepDesign): void {
  const problems = designProblems(params, design);
  if (problems.length > 0) throw new RangeError(`invalid sweep: ${problems.join('; ')}`);
}
