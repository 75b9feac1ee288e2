// Every point of a sweep design, as parameter values in the order of `params`. Point index = row
// index; the server and the command line both number points this way, and each point's seed
// derives from the sweep seed and that index (pointSeed), so results never depend on which
// worker ran which point.
import { Sampler } from '../random/sampler';
import { streamFor } from '../random/stream';
import type { SweepDesign, SweepParameter } from './design';
import { latinHypercubeUnits } from './latin-hypercube';
import { sobolSequence } from './sobol-sequence';
import { LATIN_HYPERCUBE_STREAM, SOBOL_SCRAMBLE_STREAM } from './streams';
import { assertValidDesign } from './validate';
import { factorialLevels, valueAt } from './values';

/**
 * Number of points, known before generating them (so the editor can show points × replicates):
 * one-at-a-time 2k + 1 (the base point is shared), factorial levels^k, latin-hypercube points,
 * sobol N·(k + 2). Needs no validation beyond the design's own numbers; a huge grid may exceed
 * Number.MAX_SAFE_INTEGER, which a workspace size limit refuses.
 */
export function designSize(params: readonly SweepParameter[], design: SweepDesign): number {
  const k = params.length;
  switch (design.kind) {
    case 'one-at-a-time':
      return 2 * k + 1;
    case 'factorial':
      return design.levels ** k;
    case 'latin-hypercube':
      return design.points;
    case 'sobol':
      return design.baseSamples * (k + 2);
  }
}

/**
 * The points, row i = point i. Orders:
 * - one-at-a-time: row 0 all bases; rows 1 + 2i and 2 + 2i parameter i at min then max, the
 *   others at base.
 * - factorial: every combination of levels once, lexicographic with the first parameter varying
 *   slowest: level of parameter j in row r = ⌊r / L^(k−1−j)⌋ mod L (levels from factorialLevels).
 * - latin-hypercube: row i = sample i, drawn from streamFor(seed, LATIN_HYPERCUBE_STREAM).
 * - sobol: N blocks of k + 2 rows, block r = [A_r, B_r, A_B^(1)_r, …, A_B^(k)_r] where A_B^(i)
 *   is A with column i taken from B (Saltelli et al. 2010, Comput. Phys. Commun. 181:259–270).
 *   A and B are the first and last k coordinates of the scrambled 2k-dimensional Sobol'
 *   sequence (streamFor(seed, SOBOL_SCRAMBLE_STREAM)), as Saltelli et al. (2010) do. Keeping a
 *   base row's k + 2 points together lets any finished prefix of blocks be analysed.
 * Whole-number parameters take whole values (see valueAt). Throws a RangeError naming every
 * problem of an invalid definition (see designProblems).
 */
export function designPoints(
  params: readonly SweepParameter[],
  design: SweepDesign,
  seed: number,
): number[][] {
  assertValidDesign(params, design);
  switch (design.kind) {
    case 'one-at-a-time':
      return oneAtATime(params);
    case 'factorial':
      return factorial(params, design.levels);
    case 'latin-hypercube': {
      const sampler = new Sampler(streamFor(seed, LATIN_HYPERCUBE_STREAM));
      return latinHypercubeUnits(design.points, params.length, sampler).map((u) =>
        u.map((x, j) => valueAt(params[j], x)),
      );
    }
    case 'sobol':
      return saltelli(params, design.baseSamples, seed);
  }
}

function oneAtATime(params: readonly SweepParameter[]): number[][] {
  const base = params.map((p) => p.base);
  const rows = [base];
  params.forEach((p, i) => {
    for (const value of [p.min, p.max]) {
      const row = base.slice();
      row[i] = value;
      rows.push(row);
    }
  });
  return rows;
}

function factorial(params: readonly SweepParameter[], levels: number): number[][] {
  const values = params.map((p) => factorialLevels(p, levels));
  const k = params.length;
  const rows: number[][] = [];
  const level = new Array<number>(k).fill(0);
  const total = levels ** k;
  for (let r = 0; r < total; r++) {
    rows.push(level.map((l, j) => values[j][l]));
    // Odometer increment, last parameter fastest.
    for (let j = k - 1; j >= 0; j--) {
      if (++level[j] < levels) break;
      level[j] = 0;
    }
  }
  return rows;
}

function saltelli(params: readonly SweepParameter[], n: number, seed: number): number[][] {
  const k = params.length;
  const sampler = new Sampler(streamFor(seed, SOBOL_SCRAMBLE_STREAM));
  const units = sobolSequence(n, 2 * k, sampler);
  const rows: number[][] = [];
  for (const u of units) {
    const a = params.map((p, j) => valueAt(p, u[j]));
    const b = params.map((p, j) => valueAt(p, u[k + j]));
    rows.push(a, b);
    for (let i = 0; i < k; i++) {
      const ab = a.slice();
      ab[i] = b[i];
      rows.push(ab);
    }
  }
  return rows;
}
