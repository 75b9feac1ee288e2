// What a sensitivity sweep varies and how it places its points. Pure data: the server maps each
// parameter's path to a scenario field; here a path is only a name carried through to the results.

/** One uncertain parameter, varied over [min, max]; base is its value when it is not being varied. */
export interface SweepParameter {
  path: string;
  min: number;
  max: number;
  base: number;
  /** Whole-number parameter (e.g. a year or a count): min, base and max must be integers. */
  integer?: boolean;
}

/**
 * The four designs of the sweep editor:
 * - one-at-a-time: the base point, then each parameter at its min and at its max (tornado chart);
 * - factorial: the full grid of `levels` evenly spaced values per parameter;
 * - latin-hypercube: `points` points, each parameter's range cut into `points` equal strata
 *   with one point in each (McKay, Beckman & Conover 1979, Technometrics 21:239–245);
 * - sobol: Saltelli (2010) sampling, `baseSamples` rows of the A and B matrices and of each
 *   A_B^(i), for first-order and total Sobol' indices.
 */
export type SweepDesign =
  | { kind: 'one-at-a-time' }
  | { kind: 'factorial'; levels: number }
  | { kind: 'latin-hypercube'; points: number }
  | { kind: 'sobol'; baseSamples: number };

export type SweepDesignKind = SweepDesign['kind'];
