// Reproducibility as the model brief requires: (inputs, seed) → the same output bit for
// bit, whatever the batch split; each replicate has its own stream from (seed, index).
import { describe, expect, it } from 'vitest';
import { mergeReplicateBlocks, seriesNames } from '../../../models/projection/trajectories';
import { ProjectionCancelledError, runReplicates } from '../../../models/projection/replicates';
import { summarise } from '../../../models/projection/summarise';
import type { ReplicateBlock } from '../../../models/projection/trajectories';
import { scenarioFrom } from './fixtures';

const demo = scenarioFrom('demo-perennial-dock');

const sameBits = (a: ReplicateBlock, b: ReplicateBlock) => {
  for (const name of seriesNames) {
    expect(Buffer.from(a.series[name].buffer).equals(Buffer.from(b.series[name].buffer)), name).toBe(true);
  }
};

describe('reproducibility', () => {
  const whole = runReplicates(demo, 0, 1000);

  it('same seed twice gives identical trajectories', () => {
    sameBits(whole, runReplicates(demo, 0, 1000));
  });

  it('1 × 1000 and 4 × 250 (merged in any order) are identical, summary included', () => {
    const blocks = [750, 0, 500, 250].map((from) => runReplicates(demo, from, from + 250));
    const merged = mergeReplicateBlocks(blocks);
    sameBits(whole, merged);
    expect(merged.draws).toBe(whole.draws);
    expect(summarise(demo, merged)).toEqual(summarise(demo, whole));
  });

  it('a different seed gives different trajectories', () => {
    const other = runReplicates({ ...demo, seed: demo.seed + 1 }, 0, 1000);
    expect(
      Buffer.from(other.series.seedbankTotal.buffer).equals(Buffer.from(whole.series.seedbankTotal.buffer)),
    ).toBe(false);
  });

  it('refuses blocks with gaps or overlaps', () => {
    const a = runReplicates(demo, 0, 10);
    const c = runReplicates(demo, 20, 30);
    expect(() => mergeReplicateBlocks([a, c])).toThrow(/not contiguous/);
    expect(() => mergeReplicateBlocks([a, a])).toThrow(/not contiguous/);
  });

  it('reports progress and stops when cancelled', () => {
    const seen: number[] = [];
    runReplicates(demo, 0, 5, { onProgress: (done) => seen.push(done) });
    expect(seen).toEqual([1, 2, 3, 4, 5]);
    let calls = 0;
    expect(() => runReplicates(demo, 0, 100, { shouldCancel: () => ++calls > 3 })).toThrow(
      ProjectionCancelledError,
    );
  });
});
