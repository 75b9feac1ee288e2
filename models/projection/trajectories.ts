// Per-replicate yearly trajectories, stored flat so blocks from worker threads can be
// transferred and merged without copying element by element.
//
// Row t = 0 is the first census (seedbank and established plants as entered, flows 0);
// row t ≥ 1 holds the census at the end of year t and the flows during year t.

export const seriesNames = [
  'seedbankTotal',
  'seedbankShallow',
  'seedbankDeep',
  'emerged',
  'established',
  'flowering',
  'seedsProduced',
  'seedRain',
  'costPerHa',
] as const;

export type SeriesName = (typeof seriesNames)[number];

export const seriesUnits: Record<SeriesName, string> = {
  seedbankTotal: 'seeds/m²',
  seedbankShallow: 'seeds/m²',
  seedbankDeep: 'seeds/m²',
  emerged: 'seedlings/m²',
  established: 'plants/m²',
  flowering: 'plants/m²',
  seedsProduced: 'seeds/m²',
  seedRain: 'seeds/m²',
  costPerHa: 'cost/ha',
};

/** Replicates [fromReplicate, toReplicate) over `years` years; series[name][(r − from)·(years + 1) + t]. */
export interface ReplicateBlock {
  readonly fromReplicate: number;
  readonly toReplicate: number;
  readonly years: number;
  readonly series: Record<SeriesName, Float64Array>;
  /** Variates drawn by the block's samplers. */
  readonly draws: number;
}

export function allocateSeries(replicates: number, years: number): Record<SeriesName, Float64Array> {
  const length = replicates * (years + 1);
  const series = {} as Record<SeriesName, Float64Array>;
  for (const name of seriesNames) series[name] = new Float64Array(length);
  return series;
}

/**
 * Joins blocks of consecutive replicates (in any order) into one block. Refuses gaps,
 * overlaps and mixed horizons, which would silently change the result.
 */
export function mergeReplicateBlocks(blocks: readonly ReplicateBlock[]): ReplicateBlock {
  if (blocks.length === 0) throw new RangeError('no replicate blocks to merge');
  const sorted = [...blocks].sort((a, b) => a.fromReplicate - b.fromReplicate);
  const years = sorted[0].years;
  for (let i = 0; i < sorted.length; i++) {
    if (sorted[i].years !== years)
      throw new RangeError(
        `replicate blocks cover different horizons (${years} and ${sorted[i].years} years)`,
      );
    if (i > 0 && sorted[i].fromReplicate !== sorted[i - 1].toReplicate) {
      throw new RangeError(
        `replicate blocks are not contiguous: one ends at ${sorted[i - 1].toReplicate}, the next starts at ${sorted[i].fromReplicate}`,
      );
    }
  }
  const from = sorted[0].fromReplicate;
  const to = sorted[sorted.length - 1].toReplicate;
  const series = allocateSeries(to - from, years);
  for (const name of seriesNames) {
    let offset = 0;
    for (const block of sorted) {
      series[name].set(block.series[name], offset);
      offset += block.series[name].length;
    }
  }
  return {
    fromReplicate: from,
    toReplicate: to,
    years,
    series,
    draws: sorted.reduce((sum, b) => sum + b.draws, 0),
  };
}
