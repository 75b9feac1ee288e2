import { checkCount, checkLabel, checkPositive } from './checks';
import { RecordsError, type RecordIssue } from './records-error';

/** One line of a quadrat survey: plants of one stage counted in one quadrat in one year. */
export interface PlantCount {
  quadrat: string;
  year: number;
  /** e.g. "seedling", "rosette", "flowering"; compared after trimming, so spell stages consistently. */
  stage: string;
  count: number;
  quadratAreaM2: number;
}

/** quadrat → year → stage → count, for the quadrat-years that were surveyed. */
export type SurveyIndex = Map<string, Map<number, Map<string, number>>>;

export interface IndexedSurvey {
  index: SurveyIndex;
  /** Area of each quadrat (m²). */
  areas: Map<string, number>;
  /** Stages in the order they first appear. */
  stages: string[];
}

/**
 * Checks a survey and indexes it. A quadrat-year with a record for any stage counts as surveyed, and
 * a stage without a line there is taken as 0 plants: survey sheets usually leave absent stages out.
 * A quadrat keeps one size (permanent quadrats), and one line per quadrat, year and stage.
 */
export function indexPlantCounts(counts: readonly PlantCount[]): IndexedSurvey {
  const issues: RecordIssue[] = [];
  if (counts.length === 0) issues.push({ index: null, message: 'no plant counts were given' });
  const index: SurveyIndex = new Map();
  const areas = new Map<string, number>();
  const stages: string[] = [];
  counts.forEach((c, i) => {
    const ok = [
      checkLabel(issues, i, c.quadrat, 'quadrat'),
      checkLabel(issues, i, c.stage, 'stage'),
      checkCount(issues, i, c.count, 'plant count'),
      checkPositive(issues, i, c.quadratAreaM2, 'quadrat area (m²)'),
    ].every(Boolean);
    if (!Number.isInteger(c.year)) {
      issues.push({ index: i, message: `year must be a whole number, got ${String(c.year)}` });
      return;
    }
    if (!ok) return;
    const quadrat = c.quadrat.trim();
    const stage = c.stage.trim();
    const area = areas.get(quadrat);
    if (area === undefined) areas.set(quadrat, c.quadratAreaM2);
    else if (area !== c.quadratAreaM2) {
      issues.push({
        index: i,
        message: `quadrat ${quadrat} is ${c.quadratAreaM2} m² here but ${area} m² elsewhere`,
      });
    }
    if (!stages.includes(stage)) stages.push(stage);
    let years = index.get(quadrat);
    if (!years) index.set(quadrat, (years = new Map()));
    let byStage = years.get(c.year);
    if (!byStage) years.set(c.year, (byStage = new Map()));
    if (byStage.has(stage)) {
      issues.push({ index: i, message: `quadrat ${quadrat}, ${c.year}, ${stage} is counted twice` });
    }
    byStage.set(stage, c.count);
  });
  if (issues.length > 0) throw new RecordsError('plant counts', issues);
  return { index, areas, stages };
}

/** Plants of the given stages in one surveyed quadrat-year (absent stages are 0). */
export function sumStages(byStage: Map<string, number>, stages: readonly string[]): number {
  return stages.reduce((sum, stage) => sum + (byStage.get(stage) ?? 0), 0);
}
