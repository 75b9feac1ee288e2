import fc from 'fast-check';
import { mean, quantile, sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { DEFAULT_PROBABILITIES, summarizeYears } from '../../../models/summary/years';

/** Replicate × year tables: 1–60 replicates × 1–12 years, values like seed counts. */
const table = fc
  .tuple(fc.integer({ min: 1, max: 60 }), fc.integer({ min: 1, max: 12 }))
  .chain(([replicates, years]) =>
    fc.array(fc.array(fc.double({ min: 0, max: 1e8, noNaN: true }), { minLength: years, maxLength: years }), {
      minLength: replicates,
      maxLength: replicates,
    }),
  );

function column(rows: number[][], year: number): number[] {
  return rows.map((row) => row[year]);
}

function close(actual: number, expected: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-9 * (1 + Math.abs(expected)));
}

describe('summarizeYears', () => {
  it('matches simple-statistics mean, sampleStandardDeviation and quantile (type 7) per year', () => {
    // simple-statistics 7.12.1: sampleStandardDeviation divides by n − 1; quantile is type 7.
    fc.assert(
      fc.property(table, fc.double({ min: 0, max: 1e8, noNaN: true }), (rows, threshold) => {
        const summaries = summarizeYears(rows, { threshold });
        expect(summaries).toHaveLength(rows[0].length);
        summaries.forEach((s, year) => {
          const x = column(rows, year);
          expect(s.year).toBe(year);
          close(s.mean, mean(x));
          if (x.length > 1) close(s.sd as number, sampleStandardDeviation(x));
          else expect(s.sd).toBeNull();
          s.quantiles.forEach((q, k) => {
            expect(q.probability).toBe(DEFAULT_PROBABILITIES[k]);
            close(q.value, quantile(x, q.probability));
          });
          expect(s.probabilityBelow).toBe(x.filter((v) => v < threshold).length / x.length);
        });
      }),
      { seed: 99, numRuns: 200 },
    );
  });

  it('gives the same result for the flat Float64Array table and nested rows', () => {
    const rows = [
      [100, 60, 20, 3],
      [100, 80, 55, 40],
      [100, 30, 0.5, 0],
    ];
    const data = Float64Array.from(rows.flat());
    const flat = summarizeYears(
      { data, replicateCount: 3, yearCount: 4 },
      { probabilities: [0.1, 0.5], threshold: 1 },
    );
    expect(flat).toEqual(summarizeYears(rows, { probabilities: [0.1, 0.5], threshold: 1 }));
    // Hand check, year 2: values 20, 55, 0.5 → sorted 0.5, 20, 55; median 20; one value < 1.
    expect(flat[2].quantiles[1].value).toBe(20);
    expect(flat[2].probabilityBelow).toBeCloseTo(1 / 3, 15);
  });

  it('counts "below the threshold" strictly', () => {
    // A seedbank of exactly 1 seed/m² is not below 1 seed/m².
    const s = summarizeYears([[1], [0.999], [2], [1]], { threshold: 1 });
    expect(s[0].probabilityBelow).toBe(0.25);
    expect(summarizeYears([[1]])[0].probabilityBelow).toBeNull();
  });

  it('summarises 10,000 replicates × 51 years (the largest planned run) consistently', () => {
    // Deterministic synthetic values; checks the reused sort buffer does not leak between years.
    const replicates = 10_000;
    const years = 51;
    const data = new Float64Array(replicates * years);
    for (let r = 0; r < replicates; r++) {
      for (let y = 0; y < years; y++) data[r * years + y] = ((r * 7919 + y * 104_729) % 10_007) + y;
    }
    const summaries = summarizeYears({ data, replicateCount: replicates, yearCount: years });
    for (const y of [0, 25, 50]) {
      const x = Array.from({ length: replicates }, (_, r) => data[r * years + y]);
      close(summaries[y].mean, mean(x));
      close(summaries[y].quantiles[4].value, quantile(x, 0.95));
    }
  });

  it('rejects ragged, empty or non-finite input with the position named', () => {
    expect(() => summarizeYears([])).toThrow(/at least 1 replicate/);
    expect(() => summarizeYears([[1, 2], [3]])).toThrow(/replicate 1 has 1 years but replicate 0 has 2/);
    expect(() =>
      summarizeYears([
        [1, 2],
        [3, Number.NaN],
      ]),
    ).toThrow(/replicate 1, year 1 is NaN/);
    expect(() => summarizeYears({ data: new Float64Array(5), replicateCount: 2, yearCount: 3 })).toThrow(
      /5 values but 2 replicates × 3 years need 6/,
    );
    expect(() => summarizeYears([[1]], { probabilities: [1.5] })).toThrow(/probability must be in \[0, 1\]/);
    expect(() => summarizeYears([[1]], { threshold: Infinity })).toThrow(/threshold must be a finite number/);
  });
});
