import { num } from '../../../../shared/records/adopt-notes';
import { kindSpecs, type RecordKind } from '../../../../shared/records/columns';
import { celsiusToFahrenheit, seedsPerM2ToSeedsPerFt2, useUnits } from '../../shared/lib/units';

/** Three significant digits with grouped thousands, as the source notes write numbers. */
export const fmt = (x: number, digits = 3) => num(x, digits);

/** A fraction as a percentage with one decimal. */
export const percent = (fraction: number) => `${(fraction * 100).toFixed(1)} %`;

export const pValue = (p: number | null) => (p === null ? '—' : p < 0.0001 ? '< 0.0001' : p.toFixed(4));

export const kindTitle = (kind: RecordKind) => kindSpecs[kind].title;

export const bytesText = (n: number) =>
  n < 1024
    ? `${n} B`
    : n < 1024 * 1024
      ? `${(n / 1024).toFixed(1)} kB`
      : `${(n / 1024 / 1024).toFixed(1)} MB`;

/**
 * Densities and temperatures in the person's units. Estimates arrive per m² and in °C; per ft²
 * is the same count over 0.09290304 m² and °F is 1.8·°C + 32 (NIST SP 811), converted here.
 */
export function useRecordUnits() {
  const { system } = useUnits();
  const us = system === 'us';
  return {
    us,
    density: (perM2: number) => (us ? seedsPerM2ToSeedsPerFt2(perM2) : perM2),
    per: us ? 'ft²' : 'm²',
    temperature: (c: number) => (us ? celsiusToFahrenheit(c) : c),
    degrees: us ? '°F' : '°C',
  };
}
export type RecordUnits = ReturnType<typeof useRecordUnits>;

export const dateTime = (iso: string) =>
  new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
