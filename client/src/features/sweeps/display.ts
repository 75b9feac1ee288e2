import type { SweepStatus, SweepView } from '../../../../shared/api/sweeps';
import { outcomeInfo, outcomeLabel, type OutcomeKind } from '../../../../shared/sweeps/outcomes';
import { conversion } from '../../shared/lib/parameterDraft';
import type { UnitSystem } from '../../shared/lib/units';

/*
 * How sweeps read on the page: status and design names, numbers with their units in the
 * chosen unit system (the server's numbers are metric; area-bound units convert here).
 */

export const statusNames: Record<SweepStatus, string> = {
  queued: 'Waiting for a worker',
  running: 'Running',
  paused: 'Paused',
  done: 'Done',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

export const designNames = {
  'one-at-a-time': 'One at a time (tornado)',
  factorial: 'Full factorial grid (main effects)',
  'latin-hypercube': 'Latin hypercube (PRCC)',
  sobol: 'Sobol’ indices (Saltelli sampling)',
} as const;

export function designSummary(design: SweepView['design']): string {
  switch (design.kind) {
    case 'one-at-a-time':
      return designNames[design.kind];
    case 'factorial':
      return `${designNames[design.kind]}, ${design.levels} levels`;
    case 'latin-hypercube':
      return `${designNames[design.kind]}, ${design.points} points`;
    case 'sobol':
      return `${designNames[design.kind]}, ${design.baseSamples} base samples`;
  }
}

const significant = (x: number) =>
  Math.abs(x) >= 1000
    ? Math.round(x).toLocaleString('en-US')
    : Number(x.toPrecision(4)).toLocaleString('en-US', { maximumFractionDigits: 6 });

/** A value in a unit, converted for display: the number and the unit it is now in. */
export function shown(value: number, unit: string, system: UnitSystem) {
  const c = conversion(unit, system);
  return { value: c.toShown(value), unit: c.unit };
}

export function formatValue(value: number, unit: string, system: UnitSystem): string {
  const s = shown(value, unit, system);
  if (unit === 'probability') return `${(value * 100).toFixed(1)} %`;
  return `${significant(s.value)} ${s.unit}`;
}

/** The number alone, for table cells whose header carries the unit. */
export function formatNumber(value: number, unit: string, system: UnitSystem): string {
  if (unit === 'probability') return value.toFixed(3);
  return significant(shown(value, unit, system).value);
}

export function unitShown(unit: string, system: UnitSystem): string {
  return conversion(unit, system).unit;
}

export const outcomeTitle = (kind: OutcomeKind, year: number, system: UnitSystem) =>
  `${outcomeLabel(kind, year)} (${unitShown(outcomeInfo[kind].unit, system)})`;

export function duration(seconds: number): string {
  if (seconds < 90) return `${Math.max(1, Math.round(seconds))} s`;
  if (seconds < 5400) return `${Math.round(seconds / 60)} min`;
  return `${(seconds / 3600).toFixed(1)} h`;
}

export const grouped = (x: number) => x.toLocaleString('en-US');
