import type { Estimate } from './estimate';

/**
 * Unit factors from NIST Special Publication 811 (2008 ed.), Appendix B: the international foot is
 * exactly 0.3048 m, so a square foot is exactly 0.09290304 m² (written out rather than squared in
 * floating point, which would not give the exact decimal).
 */
export const METRES_PER_FOOT = 0.3048;
export const SQUARE_METRES_PER_SQUARE_FOOT = 0.09290304;

/** A density per m² expressed per ft² (a square foot holds 0.09290304 m² of ground). */
export function perSquareMetreToPerSquareFoot(perSquareMetre: number): number {
  return perSquareMetre * SQUARE_METRES_PER_SQUARE_FOOT;
}

export function metresToFeet(metres: number): number {
  return metres / METRES_PER_FOOT;
}

export function squareMetresToSquareFeet(squareMetres: number): number {
  return squareMetres / SQUARE_METRES_PER_SQUARE_FOOT;
}

/** NIST SP 811, Appendix B: t/°C = (t/°F − 32)/1.8; written ·5/9 so whole-degree inputs such as 59 °F give exactly 15. */
export function fahrenheitToCelsius(fahrenheit: number): number {
  return ((fahrenheit - 32) * 5) / 9;
}

/** A per-m² estimate and its limits, per ft². */
export function estimatePerSquareFoot(perM2: Estimate): Estimate {
  return {
    estimate: perSquareMetreToPerSquareFoot(perM2.estimate),
    lower: perSquareMetreToPerSquareFoot(perM2.lower),
    upper: perSquareMetreToPerSquareFoot(perM2.upper),
    confidence: perM2.confidence,
  };
}
