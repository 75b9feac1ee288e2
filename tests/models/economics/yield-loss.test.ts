import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { yearlyNetValue } from '../../../models/economics/net-value';
import { yieldLossPercent } from '../../../models/economics/yield-loss';

// Cousens 1985, J. Agric. Sci. 105:513–521: YL = I·D / (1 + I·D/A).
describe('yieldLossPercent (Cousens 1985 rectangular hyperbola)', () => {
  it('worked example: I = 1 %/plant, A = 50 %, D = 10 plants/m² → 8.333 %', () => {
    // Hand calculation from the published formula: 10 / (1 + 10/50) = 8.3333…
    expect(yieldLossPercent(10, 1, 50)).toBeCloseTo(25 / 3, 12);
    expect(yieldLossPercent(10, 1, 50).toFixed(3)).toBe('8.333');
  });

  it('has initial slope I as D → 0 and tends to A as D → ∞', () => {
    // Cousens 1985: I is the % loss per plant as density approaches 0; A the asymptote.
    const i = 2.4;
    const a = 62;
    expect(yieldLossPercent(1e-9, i, a) / 1e-9).toBeCloseTo(i, 6);
    expect(yieldLossPercent(1e12, i, a)).toBeCloseTo(a, 6);
    expect(yieldLossPercent(0, i, a)).toBe(0);
  });

  it('reaches half the asymptote at D = A/I', () => {
    // Closed form: I·D = A gives A / (1 + 1) = A/2.
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 20, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (i, a) => {
          expect(yieldLossPercent(a / i, i, a)).toBeCloseTo(a / 2, 10);
        },
      ),
      { seed: 1985, numRuns: 200 },
    );
  });

  it('is increasing in density and never exceeds A', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        fc.double({ min: 0.01, max: 20, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (d1, d2, i, a) => {
          const [lo, hi] = d1 <= d2 ? [d1, d2] : [d2, d1];
          expect(yieldLossPercent(lo, i, a)).toBeLessThanOrEqual(yieldLossPercent(hi, i, a));
          expect(yieldLossPercent(hi, i, a)).toBeLessThanOrEqual(a);
        },
      ),
      { seed: 1986, numRuns: 200 },
    );
  });

  it('rejects out-of-range parameters with the parameter named', () => {
    expect(() => yieldLossPercent(-1, 1, 50)).toThrow(/weed density/);
    expect(() => yieldLossPercent(5, -0.1, 50)).toThrow(/I \(% loss per plant/);
    expect(() => yieldLossPercent(5, 1, 0)).toThrow(/A \(asymptotic % loss\)/);
    expect(() => yieldLossPercent(5, 1, 120)).toThrow(/A \(asymptotic % loss\)/);
    expect(() => yieldLossPercent(Number.NaN, 1, 50)).toThrow(RangeError);
  });
});

describe('yearlyNetValue', () => {
  it('is crop value × (1 − YL/100) − cost', () => {
    // Hand calculation: 1500 × (1 − 8/100) − 85 = 1295.
    expect(yearlyNetValue({ cropValuePerArea: 1500, yieldLossPercent: 8, costPerArea: 85 })).toBeCloseTo(
      1295,
      10,
    );
    expect(yearlyNetValue({ cropValuePerArea: 1500, yieldLossPercent: 100, costPerArea: 85 })).toBe(-85);
  });

  it('rejects a yield loss outside 0–100 % and non-finite money', () => {
    expect(() => yearlyNetValue({ cropValuePerArea: 1, yieldLossPercent: 101, costPerArea: 0 })).toThrow(
      /yield loss/,
    );
    expect(() =>
      yearlyNetValue({ cropValuePerArea: Number.NaN, yieldLossPercent: 1, costPerArea: 0 }),
    ).toThrow(/crop value/);
    expect(() => yearlyNetValue({ cropValuePerArea: 1, yieldLossPercent: 1, costPerArea: Infinity })).toThrow(
      /cost/,
    );
  });
});
