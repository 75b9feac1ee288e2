// Metric or US customary for printed numbers (exact factors: NIST SP 811).
export type ReportUnits = 'metric' | 'us';

const M2_PER_FT2 = 0.09290304;
const HA_PER_ACRE = 0.40468564224;

export function reportUnits(units: ReportUnits) {
  const us = units === 'us';
  return {
    density: (perM2: number) => (us ? perM2 * M2_PER_FT2 : perM2),
    densityUnit: us ? 'seeds/ft²' : 'seeds/m²',
    plantsUnit: us ? 'plants/ft²' : 'plants/m²',
    money: (perHa: number) => (us ? perHa * HA_PER_ACRE : perHa),
    moneyUnit: us ? 'per acre' : 'per ha',
    area: (ha: number) => (us ? ha / HA_PER_ACRE : ha),
    areaUnit: us ? 'acres' : 'ha',
  };
}
export type Units = ReturnType<typeof reportUnits>;

export const fmt = (x: number | null | undefined, digits = 0) =>
  x === null || x === undefined || !Number.isFinite(x)
    ? '—'
    : x.toLocaleString('en', { maximumFractionDigits: digits, minimumFractionDigits: digits });
