import {
  HECTARES_PER_ACRE,
  hectaresToAcres,
  seedsPerM2ToSeedsPerFt2,
  unitLabels,
  useUnits,
  type UnitSystem,
} from '../../shared/lib/units';

/*
 * How projection numbers are shown in the person's units. The engine works per m² and
 * per ha; densities become per ft² (a count over a smaller area: × 0.09290304) and
 * money per ha becomes money per acre (the same money over 0.40468564224 ha).
 */

export type DisplayUnits = {
  system: UnitSystem;
  /** seeds/m² or seeds/ft² */
  seedUnit: string;
  /** plants/m² or plants/ft² */
  plantUnit: string;
  /** "m²" or "ft²", for sentences such as "per m²". */
  smallArea: string;
  /** "ha" or "acre", as in "per acre" */
  area: string;
  /** "ha" or "acres", after a number */
  areaPlural: string;
  density: (perM2: number) => number;
  money: (perHa: number) => number;
  /** A field's area, from ha. */
  landArea: (ha: number) => number;
};

function displayUnits(system: UnitSystem): DisplayUnits {
  const us = system === 'us';
  return {
    system,
    seedUnit: unitLabels[system].density,
    plantUnit: us ? 'plants/ft²' : 'plants/m²',
    smallArea: us ? 'ft²' : 'm²',
    area: unitLabels[system].area,
    areaPlural: us ? 'acres' : 'ha',
    density: us ? seedsPerM2ToSeedsPerFt2 : (v) => v,
    money: us ? (perHa) => perHa * HECTARES_PER_ACRE : (v) => v,
    landArea: us ? hectaresToAcres : (v) => v,
  };
}

export function useDisplayUnits(): DisplayUnits {
  return displayUnits(useUnits().system);
}

const grouped = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/**
 * A density or count as people read it: whole numbers from 100 up, three significant
 * figures below (0.0371 seeds/ft², 4.82 plants/m²), and 0 as 0.
 */
export function formatAmount(value: number): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  if (Math.abs(value) >= 100) return grouped.format(value);
  return new Intl.NumberFormat('en-US', { maximumSignificantDigits: 3 }).format(value);
}

/** Money per area, rounded to whole currency units. */
export const formatMoney = (value: number): string => (Number.isFinite(value) ? grouped.format(value) : '—');

/** A difference, signed both ways: "+3,479", "−120". */
export function formatSignedMoney(value: number): string {
  if (!Number.isFinite(value)) return '—';
  const rounded = Math.round(value);
  if (rounded === 0) return '0';
  return `${rounded > 0 ? '+' : '−'}${grouped.format(Math.abs(rounded))}`;
}

export function formatPercent(fraction: number, digits = 0): string {
  if (!Number.isFinite(fraction)) return '—';
  return `${(fraction * 100).toFixed(digits)} %`;
}
