import { estimateCountDensity, type CountDensity, type DensityOptions } from './count-density';
import type { Estimate } from './estimate';
import { indexPlantCounts, type PlantCount } from './plant-counts';
import { estimatePerSquareFoot } from './units';

export interface StageDensity extends CountDensity {
  year: number;
  stage: string;
  perFt2: Estimate;
}

/**
 * Plants/m² (and per ft²) of each stage in each year, over the quadrats surveyed that year, with the
 * same Poisson / negative-binomial choice as the seedbank (plants are clumped as seeds are).
 * Sorted by year, then by the order stages first appear in the survey.
 */
export function estimateStageDensities(
  counts: readonly PlantCount[],
  options: DensityOptions = {},
): StageDensity[] {
  const { index, areas, stages } = indexPlantCounts(counts);
  const years = [...new Set(counts.map((c) => c.year))].sort((a, b) => a - b);
  const out: StageDensity[] = [];
  for (const year of years) {
    for (const stage of stages) {
      const samples = [];
      for (const [quadrat, byYear] of index) {
        const byStage = byYear.get(year);
        if (byStage) samples.push({ count: byStage.get(stage) ?? 0, areaM2: areas.get(quadrat) as number });
      }
      const density = estimateCountDensity(samples, options);
      out.push({ year, stage, ...density, perFt2: estimatePerSquareFoot(density.perM2) });
    }
  }
  return out;
}
