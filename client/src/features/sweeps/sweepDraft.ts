import type { SweepableParameterView, SweepBody } from '../../../../shared/api/sweeps';
import type { ParameterKey } from '../../../../shared/scenario/parameters';
import type { OutcomeKind } from '../../../../shared/sweeps/outcomes';
import { draftOf, parseTyped, readNumber, type NumberDraft } from '../../shared/lib/parameterDraft';

/*
 * The sweep form's state as typed: text for every number, so nothing is lost, and the unit
 * system each parameter bound was typed in. It becomes a request body only when every field
 * reads as a number; the server then checks the rest (paths, ranges, size) and says what is
 * wrong field by field.
 */

export type ParameterDraft = { path: string; min: NumberDraft; max: NumberDraft };

export type SweepDraft = {
  name: string;
  scenarioId: string;
  strategyId: string;
  parameters: ParameterDraft[];
  design: SweepBody['design']['kind'];
  levels: string;
  points: string;
  baseSamples: string;
  outcomes: OutcomeKind[];
  outcomeYear: string;
  replicatesPerPoint: string;
  seed: string;
};

export const emptyDraft = (): SweepDraft => ({
  name: '',
  scenarioId: '',
  strategyId: '',
  parameters: [],
  design: 'latin-hypercube',
  levels: '3',
  points: '50',
  baseSamples: '32',
  outcomes: ['seedbank'],
  outcomeYear: '',
  replicatesPerPoint: '100',
  seed: '1',
});

/**
 * A starting range around the scenario's value: a quarter below to a quarter above it (one
 * step either side for whole numbers), kept inside the valid range. Only a start: the person
 * sets the range they believe.
 */
export function startingRange(p: SweepableParameterView): ParameterDraft {
  const clamp = (x: number) => Math.min(p.max, Math.max(p.min, x));
  let low: number;
  let high: number;
  if (p.integer) {
    low = clamp(p.base - 1);
    high = clamp(p.base + 1);
  } else if (p.base > 0) {
    low = clamp(p.base * 0.75);
    high = clamp(p.base * 1.25);
  } else {
    low = p.min;
    high = p.min + (p.max - p.min) * 0.1;
  }
  const round = (x: number) => Number(x.toPrecision(6));
  return { path: p.path, min: draftOf(round(low)), max: draftOf(round(high)) };
}

const whole = (text: string, what: string, errors: Record<string, string>, key: string) => {
  const v = parseTyped(text);
  if (v === null) errors[key] = `is required: ${what}`;
  else if (Number.isNaN(v) || !Number.isInteger(v)) errors[key] = `"${text.trim()}" is not a whole number`;
  return v ?? 0;
};

/** The body, or the messages of the fields that do not read as numbers yet. */
export function bodyOf(
  draft: SweepDraft,
  catalogue: ReadonlyMap<string, SweepableParameterView>,
): { body: SweepBody | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const parameters = draft.parameters.map((p, i) => {
    const key = catalogue.get(p.path)?.key as ParameterKey | undefined;
    if (!key) return { path: p.path, min: Number.NaN, max: Number.NaN };
    const min = readNumber(key, p.min);
    const max = readNumber(key, p.max);
    if (min.error) errors[`parameters[${i}].min`] = min.error;
    if (max.error) errors[`parameters[${i}].max`] = max.error;
    return { path: p.path, min: min.value ?? Number.NaN, max: max.value ?? Number.NaN };
  });
  let design: SweepBody['design'];
  switch (draft.design) {
    case 'one-at-a-time':
      design = { kind: 'one-at-a-time' };
      break;
    case 'factorial':
      design = {
        kind: 'factorial',
        levels: whole(draft.levels, 'the number of levels', errors, 'design.levels'),
      };
      break;
    case 'latin-hypercube':
      design = {
        kind: 'latin-hypercube',
        points: whole(draft.points, 'the number of points', errors, 'design.points'),
      };
      break;
    case 'sobol':
      design = {
        kind: 'sobol',
        baseSamples: whole(draft.baseSamples, 'the number of base samples', errors, 'design.baseSamples'),
      };
      break;
  }
  const outcomeYear = whole(draft.outcomeYear, 'the year T', errors, 'outcomeYear');
  const replicatesPerPoint = whole(
    draft.replicatesPerPoint,
    'replicates per point',
    errors,
    'replicatesPerPoint',
  );
  const seed = whole(draft.seed, 'a seed', errors, 'seed');
  if (draft.scenarioId === '' || draft.strategyId === '' || Object.keys(errors).length > 0)
    return { body: null, errors };
  return {
    body: {
      name: draft.name.trim() === '' ? 'Sweep' : draft.name.trim(),
      scenarioId: draft.scenarioId,
      strategyId: draft.strategyId,
      parameters,
      design,
      outcomes: draft.outcomes,
      outcomeYear,
      replicatesPerPoint,
      seed,
    },
    errors,
  };
}
