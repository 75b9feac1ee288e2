import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  acresToHectares,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  hectaresToAcres,
  kilogramsToPounds,
  poundsToKilograms,
  seedsPerFt2ToSeedsPerM2,
  seedsPerM2ToSeedsPerFt2,
} from '../../../../client/src/shared/lib/units';

// The international foot is exactly 0.3048 m (NIST SP 811, 2008, Appendix B.8: foot = 3.048 E-01 m, exact).
const FOOT_IN_METRES = 0.3048;

describe('seed density conversions', () => {
  it('counts seeds per ft² over 0.09290304 m² (NIST SP 811 B.8: square foot = 9.290304 E-02 m², exact)', () => {
    // 1 000 seeds/m² spread over one square foot: 1000 × 0.3048² = 92.90304 seeds.
    expect(seedsPerM2ToSeedsPerFt2(1000)).toBeCloseTo(1000 * FOOT_IN_METRES * FOOT_IN_METRES, 10);
    expect(seedsPerM2ToSeedsPerFt2(1000)).toBeCloseTo(92.90304, 10);
  });

  // 1 m² = 10.763 910 4 ft² (value recalled from memory; the reciprocal of the exact 0.09290304).
  it('gives 10.7639104 seeds/m² for one seed per ft²', () => {
    expect(seedsPerFt2ToSeedsPerM2(1)).toBeCloseTo(10.7639104, 7);
  });
});

describe('area conversions', () => {
  it('makes one acre 43 560 ft² (NIST Handbook 44, Appendix C: 1 acre = 43 560 ft²)', () => {
    const acreInSquareMetres = 43_560 * FOOT_IN_METRES * FOOT_IN_METRES; // 4046.8564224 m²
    expect(acresToHectares(1) * 10_000).toBeCloseTo(acreInSquareMetres, 8);
  });

  // 1 ha = 2.471 053 8 acres (value recalled from memory); hectare = 1 E+04 m² in NIST SP 811 B.8.
  it('gives 2.4710538 acres per hectare', () => {
    expect(hectaresToAcres(1)).toBeCloseTo(2.4710538147, 9);
  });
});

describe('mass conversions', () => {
  it('uses the avoirdupois pound of 0.45359237 kg (NIST SP 811 B.8: pound (avoirdupois) = 4.535 923 7 E-01 kg, exact)', () => {
    expect(poundsToKilograms(1)).toBe(0.45359237);
    // 1 kg = 2.204 623 lb, the commonly quoted rounded reciprocal (value recalled from memory).
    expect(kilogramsToPounds(1)).toBeCloseTo(2.204623, 6);
  });
});

describe('temperature conversions', () => {
  it('puts the freezing and boiling points of water at 32 °F and 212 °F (Fahrenheit scale definition, NIST SP 811 B.8)', () => {
    expect(celsiusToFahrenheit(0)).toBe(32);
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(fahrenheitToCelsius(212)).toBe(100);
  });

  it('meets the Celsius scale at −40 (t/°C = (t/°F − 32)/1.8 has its fixed point there)', () => {
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(fahrenheitToCelsius(-40)).toBe(-40);
  });
});

describe('round trips', () => {
  // Each pair is an exact inverse in real arithmetic; in doubles they may differ only by rounding.
  const pairs: Array<[string, (x: number) => number, (x: number) => number]> = [
    ['seeds/m² ↔ seeds/ft²', seedsPerM2ToSeedsPerFt2, seedsPerFt2ToSeedsPerM2],
    ['ha ↔ acre', hectaresToAcres, acresToHectares],
    ['kg ↔ lb', kilogramsToPounds, poundsToKilograms],
    ['°C ↔ °F', celsiusToFahrenheit, fahrenheitToCelsius],
  ];
  for (const [name, there, back] of pairs) {
    it(`${name} returns the value it started from`, () => {
      fc.assert(
        fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
          expect(back(there(x))).toBeCloseTo(x, 6);
        }),
        { seed: 20250101 },
      );
    });
  }
});
