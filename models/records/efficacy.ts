import { checkLabel, requireAlpha } from './checks';
import { lsdComparisons, type LsdComparisons } from './fisher-lsd';
import { rcbdAnova, type RcbdAnova } from './rcbd-anova';
import { RecordsError, type RecordIssue } from './records-error';

/** One plot of an efficacy trial: weed biomass or plant count after a treatment. */
export interface EfficacyPlot {
  treatment: string;
  block: string;
  /** Weed biomass or plant count on the plot (≥ 0; lower is better control). */
  response: number;
  /** Assessment timing, e.g. "2 WAT" or "6 months after fall treatment"; each timing is analysed apart. */
  timing?: string;
}

export interface EfficacyOptions {
  /** Name of the untreated check, exactly as in the treatment column. */
  check: string;
  /** Significance level for the LSD and the F test, default 0.05. */
  alpha?: number;
}

export interface TreatmentControl {
  treatment: string;
  meanResponse: number;
  /** Abbott (1925) on the treatment means: 100·(1 − mean treated / mean check), in %. */
  percentControl: number;
  /** 100·(1 − treated / check) within each block, in block order. */
  perBlock: { block: string; percentControl: number }[];
  /** Mean and sample SD (n − 1) of the per-block % control. */
  meanPercentControl: number;
  sdPercentControl: number;
  /** The same mean and SD as fractions: the form of a strategy step's efficacy. */
  efficacy: { mean: number; sd: number };
  /** Whether `efficacy` can be a step's efficacy as it stands (a beta on 0–1 with that mean and SD exists). */
  adoptable: boolean;
  /** Why it can or cannot be adopted. */
  adoptNote: string;
}

export interface EfficacyAnalysis {
  /** Null when the plots carry no timing. */
  timing: string | null;
  check: string;
  checkMean: number;
  /** Analysis of variance of the raw response over all treatments, check included. */
  anova: RcbdAnova;
  lsd: LsdComparisons;
  /** Every treatment but the check, in the order they first appear. */
  treatments: TreatmentControl[];
}

/**
 * % control against the untreated check by Abbott's formula (Abbott 1925, J. Econ. Entomol.
 * 18:265–267, there for insect mortality; the same ratio is the usual % control of weed biomass or
 * counts), the RCBD analysis of variance and Fisher's LSD per assessment timing, and a mean ± SD of
 * per-block % control ready to become a step's efficacy. Per-block values are taken against that
 * block's own check, so block-to-block differences in weed pressure do not count as spread in
 * efficacy. % control is not clipped: a negative value means more weeds than the check and is shown
 * as such rather than hidden as 0.
 */
export function analyseEfficacy(
  plots: readonly EfficacyPlot[],
  options: EfficacyOptions,
): EfficacyAnalysis[] {
  const alpha = options.alpha ?? 0.05;
  requireAlpha(alpha, 'significance level');
  const issues: RecordIssue[] = [];
  if (typeof options.check !== 'string' || options.check.trim() === '') {
    throw new RangeError('the untreated check must be named');
  }
  const check = options.check.trim();
  if (plots.length === 0) issues.push({ index: null, message: 'no plots were given' });
  const timed = plots.filter((p) => p.timing !== undefined).length;
  if (timed > 0 && timed < plots.length) {
    issues.push({
      index: null,
      message: `${timed} of ${plots.length} plots have an assessment timing: give it for all or none`,
    });
  }
  plots.forEach((p, index) => {
    if (typeof p.response === 'number' && p.response < 0) {
      issues.push({ index, message: `response (biomass or count) must not be negative, got ${p.response}` });
    }
    if (p.timing !== undefined) checkLabel(issues, index, p.timing, 'assessment timing');
  });
  if (issues.length > 0) throw new RecordsError('efficacy trial', issues);

  const groups = new Map<string | null, number[]>();
  plots.forEach((p, index) => {
    const key = p.timing === undefined ? null : p.timing.trim();
    const list = groups.get(key);
    if (list) list.push(index);
    else groups.set(key, [index]);
  });

  const analyses: EfficacyAnalysis[] = [];
  for (const [timing, indices] of groups) {
    const where = timing === null ? '' : `timing ${timing}: `;
    const group = indices.map((i) => plots[i]);
    let anova: RcbdAnova;
    try {
      anova = rcbdAnova(group);
    } catch (error) {
      if (!(error instanceof RecordsError)) throw error;
      for (const issue of error.issues) {
        issues.push({
          index: issue.index === null ? null : indices[issue.index],
          message: where + issue.message,
        });
      }
      continue;
    }
    const checkRow = anova.treatments.indexOf(check);
    if (checkRow < 0) {
      issues.push({
        index: null,
        message: `${where}the untreated check "${check}" is missing (treatments: ${anova.treatments.join(', ')})`,
      });
      continue;
    }
    const checkByBlock = new Map(
      group.filter((p) => p.treatment.trim() === check).map((p) => [p.block.trim(), p.response]),
    );
    const zeroBlocks = anova.blocks.filter((b) => !((checkByBlock.get(b) as number) > 0));
    if (zeroBlocks.length > 0) {
      issues.push({
        index: null,
        message: `${where}the untreated check has no weeds in block(s) ${zeroBlocks.join(', ')}, so % control there is undefined`,
      });
      continue;
    }
    const checkMean = anova.means[checkRow];
    const treatments = anova.treatments
      .map((treatment, row) => ({ treatment, row }))
      .filter(({ row }) => row !== checkRow)
      .map(({ treatment, row }) =>
        control(treatment, anova.means[row], checkMean, anova.blocks, group, checkByBlock),
      );
    analyses.push({ timing, check, checkMean, anova, lsd: lsdComparisons(anova, alpha), treatments });
  }
  if (issues.length > 0) throw new RecordsError('efficacy trial', issues);
  return analyses;
}

function control(
  treatment: string,
  meanResponse: number,
  checkMean: number,
  blocks: readonly string[],
  group: readonly EfficacyPlot[],
  checkByBlock: ReadonlyMap<string, number>,
): TreatmentControl {
  const byBlock = new Map(
    group.filter((p) => p.treatment.trim() === treatment).map((p) => [p.block.trim(), p.response]),
  );
  const perBlock = blocks.map((block) => ({
    block,
    percentControl: 100 * (1 - (byBlock.get(block) as number) / (checkByBlock.get(block) as number)),
  }));
  const values = perBlock.map((b) => b.percentControl);
  const mean = values.reduce((sum, v) => sum + v, 0) / values.length;
  const sd = Math.sqrt(values.reduce((sum, v) => sum + (v - mean) ** 2, 0) / (values.length - 1));
  const efficacy = { mean: mean / 100, sd: sd / 100 };
  return {
    treatment,
    meanResponse,
    percentControl: 100 * (1 - meanResponse / checkMean),
    perBlock,
    meanPercentControl: mean,
    sdPercentControl: sd,
    efficacy,
    ...adoptability(efficacy),
  };
}

/** Mirrors the strategy schema: mean in [0, 1], and sd² < mean·(1 − mean) unless sd = 0. */
function adoptability({ mean, sd }: { mean: number; sd: number }): { adoptable: boolean; adoptNote: string } {
  if (mean < 0) {
    return {
      adoptable: false,
      adoptNote: 'mean % control is negative: the treatment left more weeds than the check',
    };
  }
  if (mean > 1) return { adoptable: false, adoptNote: 'mean % control exceeds 100 %' };
  const largest = Math.sqrt(mean * (1 - mean));
  if (sd > 0 && !(sd < largest)) {
    return {
      adoptable: false,
      adoptNote: `the spread across blocks (SD ${sd.toFixed(3)}) is too large for a mean of ${mean.toFixed(3)} on 0–1 (needs SD below ${largest.toFixed(3)})`,
    };
  }
  return {
    adoptable: true,
    adoptNote: 'mean and SD of per-block % control against each block’s untreated check, as fractions',
  };
}
