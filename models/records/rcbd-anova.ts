import fCdf from '@stdlib/stats-base-dists-f-cdf';
import { checkLabel } from './checks';
import { RecordsError, type RecordIssue } from './records-error';

/** One plot of a randomised complete block trial. */
export interface PlotObservation {
  treatment: string;
  block: string;
  response: number;
}

export interface AnovaRow {
  df: number;
  ss: number;
  /** Mean square SS/df; null for the total line, which has none in the usual table. */
  ms: number | null;
  /** MS / MS_error for blocks and treatments; null for error and total, or when MS_error = 0. */
  f: number | null;
  /** Upper-tail probability of F on (df, df_error); null wherever F is. */
  p: number | null;
}

export interface RcbdAnova {
  /** In the order treatments first appear. */
  treatments: string[];
  blocks: string[];
  /** Mean response per treatment, in `treatments` order. */
  means: number[];
  grandMean: number;
  blocksRow: AnovaRow;
  treatmentsRow: AnovaRow;
  errorRow: AnovaRow;
  totalRow: AnovaRow;
  /** Coefficient of variation, 100·√MS_error / grand mean (%), as agronomy tables report it. */
  cvPercent: number;
}

/**
 * Two-way analysis of variance of a randomised complete block design without interaction
 * (treatments t, blocks r, one plot per treatment per block):
 *     SS_blocks = t·Σ(ȳ.ⱼ − ȳ..)²  (r − 1 df),   SS_treatments = r·Σ(ȳᵢ. − ȳ..)²  (t − 1 df),
 *     SS_error  = Σ(yᵢⱼ − ȳᵢ. − ȳ.ⱼ + ȳ..)²  ((t − 1)(r − 1) df),   SS_total = Σ(yᵢⱼ − ȳ..)²  (tr − 1 df).
 * Sums of squares are taken about the means rather than by the desk-calculator correction-factor
 * route, which loses digits when responses are large and close together; the error line is summed
 * from its own residuals, so SS_total = SS_blocks + SS_treatments + SS_error is a check, not a
 * definition.
 * The design must be balanced: every treatment exactly once in every block (a missing or doubled
 * plot needs a missing-plot or unbalanced analysis, which this is not).
 */
export function rcbdAnova(plots: readonly PlotObservation[]): RcbdAnova {
  const { treatments, blocks, cells } = balancedTable(plots);
  const t = treatments.length;
  const r = blocks.length;
  const grandMean = cells.flat().reduce((sum, y) => sum + y, 0) / (t * r);
  const means = cells.map((row) => row.reduce((sum, y) => sum + y, 0) / r);
  const blockMeans = blocks.map((_, j) => cells.reduce((sum, row) => sum + row[j], 0) / t);

  let ssTotal = 0;
  let ssError = 0;
  for (let i = 0; i < t; i++) {
    for (let j = 0; j < r; j++) {
      ssTotal += (cells[i][j] - grandMean) ** 2;
      ssError += (cells[i][j] - means[i] - blockMeans[j] + grandMean) ** 2;
    }
  }
  const ssBlocks = t * blockMeans.reduce((sum, m) => sum + (m - grandMean) ** 2, 0);
  const ssTreatments = r * means.reduce((sum, m) => sum + (m - grandMean) ** 2, 0);

  const dfError = (t - 1) * (r - 1);
  const mse = ssError / dfError;
  const effect = (ss: number, df: number): AnovaRow => {
    const ms = ss / df;
    if (!(mse > 0)) return { df, ss, ms, f: null, p: null };
    const f = ms / mse;
    return { df, ss, ms, f, p: 1 - fCdf(f, df, dfError) };
  };
  return {
    treatments,
    blocks,
    means,
    grandMean,
    blocksRow: effect(ssBlocks, r - 1),
    treatmentsRow: effect(ssTreatments, t - 1),
    errorRow: { df: dfError, ss: ssError, ms: mse, f: null, p: null },
    totalRow: { df: t * r - 1, ss: ssTotal, ms: null, f: null, p: null },
    cvPercent: (100 * Math.sqrt(mse)) / grandMean,
  };
}

/** Treatment × block table of responses, or every reason it is not a complete balanced table. */
function balancedTable(plots: readonly PlotObservation[]): {
  treatments: string[];
  blocks: string[];
  cells: number[][];
} {
  const issues: RecordIssue[] = [];
  const treatments: string[] = [];
  const blocks: string[] = [];
  // The message names the repeated plot but not the first one's position: callers that pass a
  // subset (one timing of a trial) renumber `index`, and a number inside the text would go stale.
  const seen = new Set<string>();
  plots.forEach((p, index) => {
    const ok = [
      checkLabel(issues, index, p.treatment, 'treatment'),
      checkLabel(issues, index, p.block, 'block'),
    ].every(Boolean);
    if (!(typeof p.response === 'number' && Number.isFinite(p.response))) {
      issues.push({ index, message: `response must be a number, got ${String(p.response)}` });
    }
    if (!ok) return;
    const treatment = p.treatment.trim();
    const block = p.block.trim();
    if (!treatments.includes(treatment)) treatments.push(treatment);
    if (!blocks.includes(block)) blocks.push(block);
    const key = JSON.stringify([treatment, block]);
    if (seen.has(key)) {
      issues.push({ index, message: `treatment ${treatment} appears more than once in block ${block}` });
    } else seen.add(key);
  });
  if (issues.length === 0) {
    if (treatments.length < 2)
      issues.push({
        index: null,
        message: `an RCBD needs at least 2 treatments, found ${treatments.length}`,
      });
    if (blocks.length < 2)
      issues.push({ index: null, message: `an RCBD needs at least 2 blocks, found ${blocks.length}` });
    for (const treatment of treatments) {
      const missing = blocks.filter((block) => !seen.has(JSON.stringify([treatment, block])));
      if (missing.length > 0) {
        issues.push({
          index: null,
          message: `unbalanced design: treatment ${treatment} is missing from block(s) ${missing.join(', ')}; every treatment must occur once in every block`,
        });
      }
    }
  }
  if (issues.length > 0) throw new RecordsError('randomised complete block trial', issues);
  const cells = treatments.map(() => new Array<number>(blocks.length).fill(0));
  for (const p of plots) {
    cells[treatments.indexOf(p.treatment.trim())][blocks.indexOf(p.block.trim())] = p.response;
  }
  return { treatments, blocks, cells };
}
