import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decayOnlyHalfLife, halfLifeYears } from '../../../../client/src/features/profiles/halfLife';

// Closed form of geometric decay: N(t) = N0·(1 − d)^t reaches N0/2 at t = ln 2 / −ln(1 − d).
const closedForm = (d: number) => Math.log(2) / -Math.log(1 - d);

describe('half-life of a seedbank layer', () => {
  it('is ln 2 / −ln(1 − d) for decay alone', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), (d) => {
        expect(decayOnlyHalfLife(d)).toBeCloseTo(closedForm(d), 12);
      }),
    );
  });

  it('gives one year for 50 % loss a year and about 13.5 years for 5 %', () => {
    // (1 − 0.5)^1 = 0.5 exactly; ln 2 / −ln 0.95 = 13.513… (value recalled from memory).
    expect(decayOnlyHalfLife(0.5)).toBeCloseTo(1, 12);
    expect(decayOnlyHalfLife(0.05)).toBeCloseTo(13.513, 3);
  });

  it('has no half-life without decay', () => {
    expect(decayOnlyHalfLife(0)).toBeNull();
  });

  it('reads the closed-form half-life off a yearly census of geometric decay', () => {
    // Log-linear interpolation between census years is exact for a geometric series.
    fc.assert(
      fc.property(fc.double({ min: 0.02, max: 0.9, noNaN: true }), (d) => {
        const census = Array.from({ length: 41 }, (_, t) => 1000 * (1 - d) ** t);
        expect(halfLifeYears(census)).toBeCloseTo(closedForm(d), 9);
      }),
    );
  });

  it('says null when the series never falls to half within the census', () => {
    // 1 % a year leaves 0.99^40 ≈ 67 % after 40 years (closed form), above one half.
    const census = Array.from({ length: 41 }, (_, t) => 1000 * 0.99 ** t);
    expect(halfLifeYears(census)).toBeNull();
  });
});
