import * as formulajs from '@formulajs/formulajs';

/**
 * Wilson (1927, JASA 22:209–212) score interval written out from the formula, with z from formulajs,
 * as an independent reference for the estimators' binomial intervals.
 */
export function wilsonReference(x: number, n: number, confidence = 0.95): [number, number] {
  const z = formulajs.NORM.S.INV(1 - (1 - confidence) / 2);
  const p = x / n;
  const scale = 1 + (z * z) / n;
  const centre = (p + (z * z) / (2 * n)) / scale;
  const half = (z / scale) * Math.sqrt((p * (1 - p)) / n + (z * z) / (4 * n * n));
  return [centre - half, centre + half];
}

/** Student t quantile from formulajs (jStat), independent of @stdlib's. */
export function tQuantileReference(p: number, df: number): number {
  return numeric(formulajs.T.INV(p, df));
}

/** Upper tail of the F distribution from formulajs (jStat), independent of @stdlib's F CDF. */
export function fUpperTailReference(f: number, df1: number, df2: number): number {
  return numeric(formulajs.F.DIST.RT(f, df1, df2));
}

/** formulajs returns spreadsheet error values instead of throwing. */
function numeric(value: unknown): number {
  if (typeof value !== 'number') throw new Error(`formulajs returned ${String(value)}`);
  return value;
}
