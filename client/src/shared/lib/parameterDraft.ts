import {
  isInRange,
  parameterCatalogue,
  rangeText,
  type NumericParameter,
  type ParameterKey,
} from '../../../../shared/scenario/parameters';
import { HECTARES_PER_ACRE, SQUARE_METRES_PER_SQUARE_FOOT, type UnitSystem } from './units';

/*
 * Numeric parameter inputs. The catalogue states every value in metric; a person on US
 * customary units types and reads per ft², per acre and ft²/plant instead. What they type
 * is kept as text together with the unit system it was typed in, so a half-typed value is
 * never lost, and a value typed in one system converts exactly once, when it is read.
 */

type Conversion = { unit: string; toShown: (metric: number) => number; fromShown: (shown: number) => number };

const identity = (unit: string): Conversion => ({ unit, toShown: (v) => v, fromShown: (v) => v });
const k = SQUARE_METRES_PER_SQUARE_FOOT;

/** US customary equivalents of the catalogue's area-bound units; other units are the same in both systems. */
const usUnits: Record<string, Conversion> = {
  // Per m² → per ft²: the same density counted over a smaller area.
  'seeds/m²': { unit: 'seeds/ft²', toShown: (v) => v * k, fromShown: (v) => v / k },
  'plants/m²': { unit: 'plants/ft²', toShown: (v) => v * k, fromShown: (v) => v / k },
  'seeds/m²/year': { unit: 'seeds/ft²/year', toShown: (v) => v * k, fromShown: (v) => v / k },
  // Area per plant (a crowding coefficient, or % loss per plant/m²): the inverse.
  'm²/plant': { unit: 'ft²/plant', toShown: (v) => v / k, fromShown: (v) => v * k },
  '% per plant/m²': { unit: '% per plant/ft²', toShown: (v) => v / k, fromShown: (v) => v * k },
  // Money per ha → per acre; an area in ha → acres.
  'currency/ha': {
    unit: 'currency/acre',
    toShown: (v) => v * HECTARES_PER_ACRE,
    fromShown: (v) => v / HECTARES_PER_ACRE,
  },
  'currency/ha/year': {
    unit: 'currency/acre/year',
    toShown: (v) => v * HECTARES_PER_ACRE,
    fromShown: (v) => v / HECTARES_PER_ACRE,
  },
  ha: { unit: 'acre', toShown: (v) => v / HECTARES_PER_ACRE, fromShown: (v) => v * HECTARES_PER_ACRE },
};

export function conversion(metricUnit: string, system: UnitSystem): Conversion {
  if (system === 'metric') return identity(metricUnit);
  return usUnits[metricUnit] ?? identity(metricUnit);
}

/** A converted value to six significant figures, without trailing zeros; metric values are shown exactly. */
export function formatForInput(value: number): string {
  if (Number.isInteger(value)) return String(value);
  return String(Number(value.toPrecision(6)));
}

/** How a number reads in text: grouped thousands, up to four decimals. */
export function formatNumber(value: number, maximumFractionDigits = 4): string {
  return value.toLocaleString('en-US', { maximumFractionDigits });
}

/** Text as typed, and the unit system it was typed in. */
export type NumberDraft = { readonly text: string; readonly system: UnitSystem };

/** A stored (metric) value as a draft; undefined or null gives an empty field. */
export function draftOf(value: number | null | undefined): NumberDraft {
  return { text: value === null || value === undefined ? '' : String(value), system: 'metric' };
}

export const typedDraft = (text: string, system: UnitSystem): NumberDraft => ({ text, system });

/** Accepts "1200", "1,200", "0.25", "2e3"; a comma is only a thousands separator. */
export function parseTyped(text: string): number | null {
  const trimmed = text.trim().replace(/[\s\u202f_]/g, '');
  if (trimmed === '') return null;
  const plain = /^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(trimmed) ? trimmed.replace(/,/g, '') : trimmed;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(plain)) return Number.NaN;
  return Number(plain);
}

/** The parameter restated in a unit system: unit, bounds and default converted for display. */
export function shownParameter(p: NumericParameter, system: UnitSystem): NumericParameter {
  const c = conversion(p.unit, system);
  if (c.unit === p.unit) return p;
  return {
    ...p,
    unit: c.unit,
    min: c.toShown(p.min),
    max: p.max === Number.MAX_VALUE ? p.max : c.toShown(p.max),
    default: p.default === null ? null : c.toShown(p.default),
  };
}

/** The text to put in the input now: what was typed, or its conversion if the units were switched since. */
export function shownText(key: ParameterKey, draft: NumberDraft, system: UnitSystem): string {
  if (draft.system === system) return draft.text;
  const value = parseTyped(draft.text);
  if (value === null || Number.isNaN(value)) return draft.text;
  const p = parameterCatalogue[key];
  const metric = conversion(p.unit, draft.system).fromShown(value);
  return formatForInput(conversion(p.unit, system).toShown(metric));
}

export type ReadNumber = { value: number | undefined; error?: string };

/**
 * The metric value of a draft, or the message to show beside the field. The checks are
 * the catalogue's (range, whole number), stated in the units the text was typed in, with
 * the same wording as the server's messages.
 */
export function readNumber(key: ParameterKey, draft: NumberDraft, optional = false): ReadNumber {
  const p: NumericParameter = parameterCatalogue[key];
  const shown = shownParameter(p, draft.system);
  const typed = parseTyped(draft.text);
  if (typed === null) {
    return optional
      ? { value: undefined }
      : { value: undefined, error: `is required: a number ${rangeText(shown)}` };
  }
  if (Number.isNaN(typed)) {
    return {
      value: undefined,
      error: `"${draft.text.trim()}" is not a number; expected ${rangeText(shown)}`,
    };
  }
  const metric = conversion(p.unit, draft.system).fromShown(typed);
  // Bounds are checked on the typed value against converted bounds, so a value typed
  // exactly at a converted limit is not refused by a rounding error in the conversion.
  if (!isInRange(shown, typed)) {
    const verb = p.max === Number.MAX_VALUE ? 'must be' : 'is outside';
    return { value: undefined, error: `${draft.text.trim()} ${verb} ${rangeText(shown)}` };
  }
  if (p.integer && !Number.isInteger(typed)) {
    return { value: undefined, error: `${draft.text.trim()} is not a whole number (${shown.unit})` };
  }
  return { value: Math.min(p.max, Math.max(p.min, metric)) };
}
