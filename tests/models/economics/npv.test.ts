import { NPV } from '@formulajs/formulajs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { netPresentValue } from '../../../models/economics/npv';

/** Spreadsheet NPV from @formulajs/formulajs (first value discounted by one period). */
function spreadsheetNpv(rate: number, flows: number[]): number {
  const value = NPV(rate, ...flows);
  if (typeof value !== 'number') throw value;
  return value;
}

const rate = fc.double({ min: -0.5, max: 0.5, noNaN: true });
const flows = fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 60 });
const RUNS = { seed: 515, numRuns: 300 };

function closeRelative(actual: number, expected: number, scale: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-12 * scale);
}

describe('netPresentValue', () => {
  it('equals spreadsheet NPV (formulajs) by default: year 1 discounted once', () => {
    fc.assert(
      fc.property(rate, flows, (r, cf) => {
        const scale = cf.reduce((s, x) => s + Math.abs(x), 0) * Math.max(1, (1 + r) ** -cf.length);
        closeRelative(netPresentValue(r, cf), spreadsheetNpv(r, cf), scale);
      }),
      RUNS,
    );
  });

  it('with firstYearDiscounted: false, equals CF0 + spreadsheet NPV of the rest', () => {
    // Common practice, no published source: the "year 0 = today" convention adds the first flow undiscounted.
    fc.assert(
      fc.property(rate, flows, (r, cf) => {
        const expected = cf[0] + (cf.length > 1 ? spreadsheetNpv(r, cf.slice(1)) : 0);
        const scale = cf.reduce((s, x) => s + Math.abs(x), 0) * Math.max(1, (1 + r) ** -cf.length);
        closeRelative(netPresentValue(r, cf, { firstYearDiscounted: false }), expected, scale);
      }),
      RUNS,
    );
  });

  it('matches the annuity closed form C·(1 − (1 + r)^−n)/r', () => {
    // Present value of an ordinary annuity (standard finance identity).
    const c = 120;
    const r = 0.06;
    const n = 25;
    expect(netPresentValue(r, new Array<number>(n).fill(c))).toBeCloseTo((c * (1 - (1 + r) ** -n)) / r, 9);
  });

  it('handles a zero rate and an empty series', () => {
    expect(netPresentValue(0, [10, -4, 7])).toBe(13);
    expect(netPresentValue(0.05, [])).toBe(0);
  });

  it('rejects rates ≤ −1 and non-finite flows', () => {
    expect(() => netPresentValue(-1, [1])).toThrow(/discount rate per year must be a finite fraction > -1/);
    expect(() => netPresentValue(Number.NaN, [1])).toThrow(RangeError);
    expect(() => netPresentValue(0.05, [1, Infinity])).toThrow(/cash flow of year index 1/);
  });
});
