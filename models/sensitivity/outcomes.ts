// The analyses take one finite outcome per design point (e.g. the replicate mean at that point);
// a failed or undefined point must be resolved by the caller first, because every estimator
// below would silently change meaning with a point missing.

/** Throws a RangeError naming the first point whose outcome is not a finite number. */
export function assertFiniteOutcomes(outcomes: readonly number[]): void {
  const bad = outcomes.findIndex((y) => !Number.isFinite(y));
  if (bad >= 0) throw new RangeError(`outcome of point ${bad} is not a finite number (${outcomes[bad]})`);
}

/** Throws a RangeError unless there is exactly one outcome per point of a design of `size` points. */
export function assertOutcomeCount(outcomes: readonly number[], size: number, design: string): void {
  if (outcomes.length !== size) {
    throw new RangeError(
      `a ${design} design of ${size} points needs ${size} outcomes, got ${outcomes.length}`,
    );
  }
}
