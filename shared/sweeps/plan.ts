// Checks a sweep definition against its base scenario and sizes it, before any point is
// made: each problem names the field it is about (as the API's 400 `fields` do), so the
// form can put the message beside the input.
import type { Scenario } from '../../models/scenario/types';
import type { SweepParameter } from '../../models/sensitivity/design';
import { designSize } from '../../models/sensitivity/points';
import { designProblems } from '../../models/sensitivity/validate';
import { isInRange, rangeText, type NumericParameter } from '../scenario/parameters';
import { sweepableParameters, type SweepableParameter } from './parameters';
import type { SweepSpec } from './schema';

/** A varied parameter as the design and the results need it. */
export type SweptParameter = SweepParameter & { label: string; unit: string };

export interface SweepPlan {
  parameters: SweptParameter[];
  /** Number of design points. */
  points: number;
  /** points × replicates per point × horizon years: the work, in the units the engine's speed is measured in. */
  replicateYears: number;
}

export type SweepProblems = Record<string, string>;

const grouped = (x: number) => x.toLocaleString('en-US', { maximumFractionDigits: 6 });

function rangeProblem(p: SweepableParameter, value: number): string | null {
  const catalogue: NumericParameter = { ...p, default: null, defaultSource: '' };
  if (!isInRange(catalogue, value))
    return `${grouped(value)} is outside the valid range ${rangeText(catalogue)}`;
  if (p.integer && !Number.isInteger(value)) return `${grouped(value)} is not a whole number (${p.unit})`;
  return null;
}

function designZero(design: SweepSpec['design']): string {
  switch (design.kind) {
    case 'factorial':
      return 'The design has zero points: a factorial grid needs at least 2 levels';
    case 'latin-hypercube':
      return 'The design has zero points: give at least 1 Latin hypercube point';
    case 'sobol':
      return 'The design has zero points: give at least 2 Sobol’ base samples';
    case 'one-at-a-time':
      return 'The design has zero points';
  }
}

export function planSweep(
  base: Scenario,
  spec: SweepSpec,
): { ok: true; plan: SweepPlan } | { ok: false; problems: SweepProblems } {
  const problems: SweepProblems = {};
  const sweepable = new Map(sweepableParameters(base).map((p) => [p.path, p]));
  const seen = new Set<string>();
  const parameters: SweptParameter[] = [];
  if (spec.parameters.length === 0) problems.parameters = 'Pick at least one parameter to vary';
  spec.parameters.forEach((input, i) => {
    const at = `parameters[${i}]`;
    const p = sweepable.get(input.path);
    if (!p) {
      problems[`${at}.path`] =
        `"${input.path}" is not a numeric parameter of this scenario’s profile, field or steps`;
      return;
    }
    if (seen.has(input.path)) {
      problems[`${at}.path`] = `"${input.path}" is listed twice`;
      return;
    }
    seen.add(input.path);
    const minProblem = rangeProblem(p, input.min);
    const maxProblem = rangeProblem(p, input.max);
    if (minProblem) problems[`${at}.min`] = minProblem;
    if (maxProblem) problems[`${at}.max`] = maxProblem;
    if (minProblem || maxProblem) return;
    if (input.min > input.max) {
      problems[`${at}.min`] = `min ${grouped(input.min)} is above max ${grouped(input.max)} (${p.unit})`;
      return;
    }
    if (input.min === input.max) {
      problems[`${at}.max`] = `min and max are both ${grouped(input.min)}: a varied parameter needs a range`;
      return;
    }
    const inside = p.base >= input.min && p.base <= input.max;
    if (spec.design.kind === 'one-at-a-time' && !inside) {
      problems[`${at}.min`] =
        `The scenario’s value ${grouped(p.base)} lies outside ${grouped(input.min)}–${grouped(input.max)}; a one-at-a-time sweep moves each parameter away from it`;
      return;
    }
    // Other designs never use the base; it is kept inside the range only because the
    // design's checks expect it there.
    const baseValue = Math.min(input.max, Math.max(input.min, p.base));
    parameters.push({
      path: p.path,
      min: input.min,
      max: input.max,
      base: baseValue,
      integer: p.integer,
      label: p.label,
      unit: p.unit,
    });
  });
  if (spec.outcomeYear > base.horizonYears) {
    problems.outcomeYear = `Year ${spec.outcomeYear} is outside the horizon 1–${base.horizonYears} (years)`;
  }
  if (Object.keys(problems).length > 0) return { ok: false, problems };

  const points = designSize(parameters, spec.design);
  if (points === 0) return { ok: false, problems: { design: designZero(spec.design) } };
  const designIssues = designProblems(parameters, spec.design);
  if (designIssues.length > 0) {
    const text = designIssues.join('; ');
    return { ok: false, problems: { design: text.charAt(0).toUpperCase() + text.slice(1) } };
  }
  return {
    ok: true,
    plan: { parameters, points, replicateYears: points * spec.replicatesPerPoint * base.horizonYears },
  };
}
