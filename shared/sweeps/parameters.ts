// Which numbers of a scenario a sweep can vary: every numeric field of the species profile,
// the field and the strategy's steps that the engine reads, each with the catalogue's label,
// unit and valid range and its value in this scenario (the base of a one-at-a-time design).
import type { Scenario } from '../../models/scenario/types';
import { parameterCatalogue, type NumericParameter, type ParameterKey } from '../scenario/parameters';
import { formatPath } from '../scenario/parse';
import type { PathSegment } from './paths';

export interface SweepableParameter {
  /** Where the value sits, e.g. "strategy.steps[1].efficacy.mean". */
  path: string;
  /** The catalogue entry it is an instance of, e.g. "strategy.steps[].efficacy.mean". */
  key: ParameterKey;
  /** The catalogue label, with the step or age class it belongs to. */
  label: string;
  meaning: string;
  unit: string;
  min: number;
  max: number;
  minExclusive: boolean;
  integer: boolean;
  /** Its value in the scenario. */
  base: number;
}

/**
 * A label's rate is the user's copy of the product label and the engine never reads it;
 * varying it would suggest rates, which the product never does.
 */
const NOT_SWEPT = new Set<string>(['strategy.steps[].chemical.rate']);

const catalogueKey = (segments: readonly PathSegment[]) =>
  segments.map((s, i) => (typeof s === 'number' ? '[]' : i === 0 ? s : `.${s}`)).join('');

function labelFor(scenario: Scenario, segments: readonly PathSegment[], p: NumericParameter): string {
  if (segments[0] === 'strategy' && typeof segments[2] === 'number') {
    const step = scenario.strategy.steps[segments[2]];
    return `Step ${segments[2] + 1} “${step.label}”: ${p.label}`;
  }
  const age = segments.find((s) => typeof s === 'number');
  return age === undefined ? p.label : `${p.label}, age class ${age}`;
}

/** Every sweepable number of the scenario, in document order (profile, field, steps). */
export function sweepableParameters(scenario: Scenario): SweepableParameter[] {
  const out: SweepableParameter[] = [];
  const walk = (node: unknown, segments: PathSegment[]) => {
    if (typeof node === 'number') {
      const key = catalogueKey(segments);
      if (!(key in parameterCatalogue) || NOT_SWEPT.has(key)) return;
      const p: NumericParameter = parameterCatalogue[key as ParameterKey];
      out.push({
        path: formatPath(segments),
        key: key as ParameterKey,
        label: labelFor(scenario, segments, p),
        meaning: p.meaning,
        unit: p.unit,
        min: p.min,
        max: p.max,
        minExclusive: p.minExclusive ?? false,
        integer: p.integer ?? false,
        base: node,
      });
      return;
    }
    if (Array.isArray(node)) node.forEach((item, i) => walk(item, [...segments, i]));
    else if (node !== null && typeof node === 'object')
      for (const [k, v] of Object.entries(node)) walk(v, [...segments, k]);
  };
  walk(scenario.profile, ['profile']);
  walk(scenario.field, ['field']);
  walk(scenario.strategy.steps, ['strategy', 'steps']);
  return out;
}
