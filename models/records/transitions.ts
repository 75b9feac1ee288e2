import { binomialInterval, type BinomialMethod, type Proportion } from './binomial-interval';
import { indexPlantCounts, sumStages, type PlantCount } from './plant-counts';
import { RecordsError, type RecordIssue } from './records-error';

/**
 * Which counts make a transition. Plants in the `from` stages of year t are the trials; plants in the
 * `to` stages of year t + yearLag in the same quadrat are the successes. Examples:
 * - rosette survival (tagged plants or a closed cohort): from ['rosette'], to ['rosette', 'flowering'],
 *   yearLag 1;
 * - flowering fraction among established plants, when flowering plants are not also counted as
 *   rosettes: from ['rosette', 'flowering'], to ['flowering'], yearLag 0.
 * A binomial rate needs the successes to be a subset of the trials, so a quadrat where the later
 * count exceeds the earlier one (recruitment into the stage) is reported as an error, not clipped.
 */
export interface TransitionSpec {
  from: string[];
  to: string[];
  yearLag: 0 | 1;
}

export interface TransitionOptions {
  method?: BinomialMethod;
  confidence?: number;
}

export interface TransitionEstimate {
  spec: TransitionSpec;
  /** All quadrats and years pooled: Σ successes / Σ trials (assumes one rate across them). */
  pooled: Proportion;
  /** One rate per starting year t, for quadrat-years with at least one plant in the `from` stages. */
  byYear: { year: number; rate: Proportion }[];
  /** Quadrat-year pairs that contributed plants. */
  pairs: number;
  /** Pairs with no plant in the `from` stages (they carry no information on the rate). */
  emptyPairs: number;
  /**
   * Quadrat-years surveyed in t whose quadrat was missed in t + 1 although the survey went on that
   * year (only for yearLag 1; the last survey year has no successor and is not counted).
   */
  unpaired: number;
}

export function estimateTransition(
  counts: readonly PlantCount[],
  spec: TransitionSpec,
  options: TransitionOptions = {},
): TransitionEstimate {
  const method = options.method ?? 'wilson';
  const confidence = options.confidence ?? 0.95;
  const { index, stages } = indexPlantCounts(counts);
  const issues: RecordIssue[] = [];
  if (spec.from.length === 0 || spec.to.length === 0) {
    issues.push({ index: null, message: 'a transition needs at least one "from" stage and one "to" stage' });
  }
  for (const stage of [...spec.from, ...spec.to]) {
    if (!stages.includes(stage)) {
      issues.push({
        index: null,
        message: `stage "${stage}" does not occur in the counts (stages present: ${stages.join(', ')})`,
      });
    }
  }
  if (issues.length > 0) throw new RecordsError('transition', issues);

  const byYear = new Map<number, { successes: number; trials: number }>();
  let pairs = 0;
  let emptyPairs = 0;
  let unpaired = 0;
  const surveyed = new Set(counts.map((c) => c.year));
  for (const [quadrat, years] of index) {
    for (const [year, byStage] of years) {
      const later = years.get(year + spec.yearLag);
      if (!later) {
        if (surveyed.has(year + spec.yearLag)) unpaired++;
        continue;
      }
      const trials = sumStages(byStage, spec.from);
      const successes = sumStages(later, spec.to);
      if (successes > trials) {
        issues.push({
          index: null,
          message:
            `quadrat ${quadrat}: ${successes} ${spec.to.join('+')} in ${year + spec.yearLag} exceed ` +
            `${trials} ${spec.from.join('+')} in ${year}; a rate needs the later plants to be among the earlier ` +
            '(recruitment into the stage, or stages counted with overlap?)',
        });
        continue;
      }
      if (trials === 0) {
        emptyPairs++;
        continue;
      }
      pairs++;
      const tally = byYear.get(year) ?? { successes: 0, trials: 0 };
      tally.successes += successes;
      tally.trials += trials;
      byYear.set(year, tally);
    }
  }
  if (issues.length > 0) throw new RecordsError('transition', issues);
  if (pairs === 0) {
    throw new RecordsError('transition', [
      {
        index: null,
        message: `no quadrat had plants in ${spec.from.join('+')} in a year followed by a survey ${spec.yearLag} year(s) later`,
      },
    ]);
  }
  const years = [...byYear.keys()].sort((a, b) => a - b);
  const successes = years.reduce((sum, y) => sum + (byYear.get(y)?.successes ?? 0), 0);
  const trials = years.reduce((sum, y) => sum + (byYear.get(y)?.trials ?? 0), 0);
  return {
    spec,
    pooled: binomialInterval(successes, trials, method, confidence),
    byYear: years.map((year) => {
      const t = byYear.get(year) as { successes: number; trials: number };
      return { year, rate: binomialInterval(t.successes, t.trials, method, confidence) };
    }),
    pairs,
    emptyPairs,
    unpaired,
  };
}
