// Field builders that turn the catalogue into zod schemas whose messages say what was
// entered and what is allowed, e.g. "1.4 is outside 0–1 (fraction per year)". The field
// path is added by parseScenario, so the same message can sit beside the form field.
import { z } from 'zod';
import { isInRange, parameterCatalogue, rangeText } from './parameters';
import type { NumericParameter, ParameterKey } from './parameters';

export function show(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number' || typeof value === 'boolean' || value === null) return String(value);
  return Array.isArray(value) ? 'a list' : 'an object';
}

export function numberField(key: ParameterKey) {
  const p: NumericParameter = parameterCatalogue[key];
  const allowed = rangeText(p);
  const outside = p.max === Number.MAX_VALUE ? 'must be' : 'is outside';
  return z
    .number({
      error: (iss) =>
        iss.input === undefined
          ? `is required: a number ${allowed}`
          : `${show(iss.input)} is not a number; expected ${allowed}`,
    })
    .check((ctx) => {
      const v = ctx.value;
      if (!isInRange(p, v))
        ctx.issues.push({ code: 'custom', input: v, message: `${v} ${outside} ${allowed}` });
      else if (p.integer && !Number.isInteger(v))
        ctx.issues.push({ code: 'custom', input: v, message: `${v} is not a whole number (${p.unit})` });
    });
}

export function choiceField<const T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, {
    error: (iss) =>
      iss.input === undefined
        ? `is required: one of ${values.join(', ')}`
        : `${show(iss.input)} is not one of ${values.join(', ')}`,
  });
}

export function textField(what: string) {
  return z
    .string({
      error: (iss) =>
        iss.input === undefined ? `is required: ${what}` : `${show(iss.input)} is not text; expected ${what}`,
    })
    .check((ctx) => {
      const v = ctx.value;
      if (v.trim().length === 0 || v.length > 200) {
        ctx.issues.push({
          code: 'custom',
          input: v,
          message: `${show(v)} must be 1–200 characters (${what})`,
        });
      }
    });
}

/** An object that names every unknown key in its message. */
export function recordOf<S extends z.ZodRawShape>(what: string, shape: S) {
  return z.strictObject(shape, {
    error: (iss) => {
      if (iss.code === 'unrecognized_keys')
        return `unknown field(s) ${iss.keys.map((k) => JSON.stringify(k)).join(', ')} in ${what}`;
      return iss.input === undefined ? `is required: ${what}` : `${show(iss.input)} is not ${what}`;
    },
  });
}
