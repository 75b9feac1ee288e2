import fc from 'fast-check';
import { quantileSeq } from 'mathjs';
import { quantileSorted as ssQuantileSorted } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { quantileSorted } from '../../../models/summary/quantile';

// Reference definitions:
// - mathjs 15.2 quantileSeq: index = p·(n − 1), linear interpolation (Hyndman & Fan type 7; read in
//   node_modules/mathjs/lib/esm/function/statistics/quantileSeq.js).
// - simple-statistics 7.12.1 quantileSorted: idx = (n − 1)·p, linear interpolation, commented in its
//   source as "matching numpy's linear method (type=7)". (Older simple-statistics releases used a
//   different, non-interpolating definition; the two agree only since this version.)
const sample = fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 200 });
// Probabilities on a 1e-6 grid: mathjs treats a subnormal p such as 5e-324 as an integer index and
// returns undefined, a quirk of the reference that says nothing about our code.
const probability = fc.integer({ min: 0, max: 1_000_000 }).map((k) => k / 1_000_000);

describe('quantileSorted (Hyndman & Fan type 7, R default)', () => {
  it('reproduces R: quantile(1:10, 0.1) = 1.9 and quantile(1:10, 0.5) = 5.5', () => {
    // Hyndman & Fan 1996, definition 7: h = (n − 1)p = 0.9 → 1 + 0.9·(2 − 1) = 1.9; h = 4.5 → 5.5.
    const x = Array.from({ length: 10 }, (_, k) => k + 1);
    expect(quantileSorted(x, 0.1)).toBeCloseTo(1.9, 14);
    expect(quantileSorted(x, 0.5)).toBe(5.5);
    expect(quantileSorted(x, 0)).toBe(1);
    expect(quantileSorted(x, 1)).toBe(10);
  });

  it('agrees with mathjs quantileSeq and simple-statistics quantileSorted', () => {
    fc.assert(
      fc.property(sample, probability, (values, p) => {
        const sorted = Float64Array.from(values).sort();
        const ours = quantileSorted(sorted, p);
        const scale = 1e-9 * (1 + Math.max(...values.map(Math.abs)));
        expect(Math.abs(ours - (quantileSeq(Array.from(sorted), p, true) as number))).toBeLessThanOrEqual(
          scale,
        );
        expect(Math.abs(ours - ssQuantileSorted(Array.from(sorted), p))).toBeLessThanOrEqual(scale);
      }),
      { seed: 7, numRuns: 400 },
    );
  });

  it('returns +Infinity rather than NaN next to censored +Infinity values', () => {
    expect(quantileSorted([1, 2, Infinity, Infinity], 0.5)).toBe(Infinity);
    expect(quantileSorted([1, Infinity, Infinity], 0.9)).toBe(Infinity);
    expect(quantileSorted([1, 3, Infinity], 0.5)).toBe(3);
  });

  it('rejects empty samples and probabilities outside [0, 1]', () => {
    expect(() => quantileSorted([], 0.5)).toThrow(/empty/);
    expect(() => quantileSorted([1], 1.01)).toThrow(/in \[0, 1\]/);
    expect(() => quantileSorted([1], Number.NaN)).toThrow(RangeError);
  });
});
