import {
  createContext,
  createElement,
  useCallback,
  useContext,
  useMemo,
  useState,
  type ReactNode,
} from 'react';

/*
 * Unit conversions and the person's unit preference. The factors are exact by definition
 * (NIST Special Publication 811, 2008 edition, Appendix B):
 *   1 ft²  = 0.09290304 m²       (international foot, 0.3048 m)
 *   1 lb   = 0.45359237 kg       (avoirdupois pound)
 *   t/°C   = (t/°F − 32) / 1.8
 * The acre is 43 560 ft² (NIST Handbook 44, Appendix C), so with the international
 * foot 1 acre = 4046.8564224 m² = 0.40468564224 ha, exactly.
 * Values are stored and computed in metric; US customary exists only for display and input.
 */

export const SQUARE_METRES_PER_SQUARE_FOOT = 0.09290304;
export const HECTARES_PER_ACRE = 0.40468564224;
export const KILOGRAMS_PER_POUND = 0.45359237;

/** A density per m² becomes a density per ft² by counting over the smaller area. */
export const seedsPerM2ToSeedsPerFt2 = (perM2: number): number => perM2 * SQUARE_METRES_PER_SQUARE_FOOT;
export const seedsPerFt2ToSeedsPerM2 = (perFt2: number): number => perFt2 / SQUARE_METRES_PER_SQUARE_FOOT;

export const hectaresToAcres = (ha: number): number => ha / HECTARES_PER_ACRE;
export const acresToHectares = (acres: number): number => acres * HECTARES_PER_ACRE;

export const kilogramsToPounds = (kg: number): number => kg / KILOGRAMS_PER_POUND;
export const poundsToKilograms = (lb: number): number => lb * KILOGRAMS_PER_POUND;

export const celsiusToFahrenheit = (c: number): number => (c * 9) / 5 + 32;
export const fahrenheitToCelsius = (f: number): number => ((f - 32) * 5) / 9;

export const unitSystems = ['metric', 'us'] as const;
export type UnitSystem = (typeof unitSystems)[number];

/** What each quantity is labelled with in each system, so pages never spell units by hand. */
export const unitLabels: Record<
  UnitSystem,
  { density: string; area: string; mass: string; temperature: string }
> = {
  metric: { density: 'seeds/m²', area: 'ha', mass: 'kg', temperature: '°C' },
  us: { density: 'seeds/ft²', area: 'acre', mass: 'lb', temperature: '°F' },
};

export const unitSystemNames: Record<UnitSystem, string> = { metric: 'Metric', us: 'US customary' };

const STORAGE_KEY = 'seedwake.units';

function isUnitSystem(value: unknown): value is UnitSystem {
  return unitSystems.includes(value as UnitSystem);
}

/** The stored preference, or metric when none is stored or storage is unavailable (private mode). */
export function readStoredUnitSystem(): UnitSystem {
  try {
    const stored = globalThis.localStorage?.getItem(STORAGE_KEY);
    return isUnitSystem(stored) ? stored : 'metric';
  } catch {
    return 'metric';
  }
}

function storeUnitSystem(system: UnitSystem): void {
  try {
    globalThis.localStorage?.setItem(STORAGE_KEY, system);
  } catch {
    // The choice still holds for this visit; it just will not survive a reload.
  }
}

type UnitsContextValue = { system: UnitSystem; setSystem: (system: UnitSystem) => void };

const UnitsContext = createContext<UnitsContextValue | null>(null);

export function UnitsProvider({ children }: { children: ReactNode }) {
  const [system, setSystemState] = useState<UnitSystem>(readStoredUnitSystem);
  const setSystem = useCallback((next: UnitSystem) => {
    storeUnitSystem(next);
    setSystemState(next);
  }, []);
  const value = useMemo(() => ({ system, setSystem }), [system, setSystem]);
  return createElement(UnitsContext.Provider, { value }, children);
}

export function useUnits(): UnitsContextValue {
  const value = useContext(UnitsContext);
  if (value === null) throw new Error('useUnits must be used inside <UnitsProvider>');
  return value;
}
