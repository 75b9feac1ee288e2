import { recordedMaxRate, type StrategyBody, type StrategyView } from '../../../../shared/api/strategies';
import { parameterCatalogue, type ParameterKey } from '../../../../shared/scenario/parameters';
import { formatPath } from '../../../../shared/scenario/parse';
import { strategySchema } from '../../../../shared/scenario/schema';
import { actionPoint, allowedTimings, targetsAllowedAt } from '../../../../models/scenario/step-kinds';
import type { Schedule, Step, StepKind, TargetStage, Timing } from '../../../../models/scenario/types';
import type { Built } from '../../shared/lib/draftForm';
import { draftOf, parseTyped, readNumber, type NumberDraft } from '../../shared/lib/parameterDraft';
import { kindInfo, type KindField } from './stepKinds';

/*
 * A strategy as it is being built. Steps carry a stable key, so a step keeps its focus,
 * its messages and its rate warnings while it is moved, and every number is kept as typed.
 * Message paths name steps by key ("steps.k3.efficacy.mean"); the server's index paths
 * ("strategy.steps[0].efficacy.mean") are translated on the way in.
 */

export type ScheduleKind = Schedule['kind'];
export type EfficacyForm = 'mean-sd' | 'range';

/** Numbers a step may carry, by the catalogue key after "strategy.steps[].". */
export const stepNumberKeys = [
  'schedule.k',
  'schedule.start',
  'schedule.first',
  'schedule.last',
  'efficacy.mean',
  'efficacy.sd',
  'efficacy.min',
  'efficacy.mode',
  'efficacy.max',
  'cost.material',
  'cost.application',
  'topKill',
  'burial',
  'exhumation',
  'fragmentsPerPlant',
  'seedsPerPlantReduction',
  'seedReturnReduction',
  'chemical.rate',
] as const;
export type StepNumberKey = (typeof stepNumberKeys)[number];

export const stepCatalogueKey = (key: StepNumberKey) => `strategy.steps[].${key}` as ParameterKey;

export type StepDraft = {
  key: string;
  kind: StepKind;
  label: string;
  timing: Timing;
  scheduleKind: ScheduleKind;
  efficacyForm: EfficacyForm;
  targets: TargetStage[];
  numbers: Record<StepNumberKey, NumberDraft>;
  activeIngredient: string;
  rateUnit: string;
};

export type MaxRateDraft = {
  key: string;
  activeIngredient: string;
  crop: string;
  maxRate: string;
  rateUnit: string;
};

export type StrategyDraft = {
  name: string;
  description: string;
  fieldId: string | null;
  steps: StepDraft[];
  maxRates: MaxRateDraft[];
};

let nextKey = 0;
/** Keys only need to be unique within one page's lifetime. */
export const newKey = (prefix: string) => `${prefix}${++nextKey}`;

const catalogueDefault = (key: StepNumberKey): number | null =>
  parameterCatalogue[stepCatalogueKey(key)].default;

function numbersFrom(values: Partial<Record<StepNumberKey, number>>): Record<StepNumberKey, NumberDraft> {
  return Object.fromEntries(
    stepNumberKeys.map((k) => [
      k,
      // The rate is never filled in: it comes from the label the person holds.
      draftOf(values[k] ?? (k === 'chemical.rate' ? null : catalogueDefault(k))),
    ]),
  ) as Record<StepNumberKey, NumberDraft>;
}

export function stepDraftFrom(step: Step): StepDraft {
  const values: Partial<Record<StepNumberKey, number>> = {
    'cost.material': step.cost.material,
    'cost.application': step.cost.application,
  };
  const s = step.schedule;
  if (s.kind === 'every-k-years') Object.assign(values, { 'schedule.k': s.k, 'schedule.start': s.start });
  if (s.kind === 'year-range') Object.assign(values, { 'schedule.first': s.first, 'schedule.last': s.last });
  const e = step.efficacy;
  if ('min' in e)
    Object.assign(values, { 'efficacy.min': e.min, 'efficacy.mode': e.mode, 'efficacy.max': e.max });
  else Object.assign(values, { 'efficacy.mean': e.mean, 'efficacy.sd': e.sd });
  if ('topKill' in step) values.topKill = step.topKill;
  if (step.kind === 'cultivation')
    Object.assign(values, {
      burial: step.burial,
      exhumation: step.exhumation,
      fragmentsPerPlant: step.fragmentsPerPlant,
    });
  if ('seedsPerPlantReduction' in step)
    Object.assign(values, {
      seedsPerPlantReduction: step.seedsPerPlantReduction,
      seedReturnReduction: step.seedReturnReduction,
    });
  const chemical = 'chemical' in step ? step.chemical : undefined;
  if (chemical?.rate !== undefined) values['chemical.rate'] = chemical.rate;
  return {
    key: newKey('s'),
    kind: step.kind,
    label: step.label,
    timing: step.timing,
    scheduleKind: s.kind,
    efficacyForm: 'min' in e ? 'range' : 'mean-sd',
    targets: 'targets' in step ? [...step.targets] : [],
    numbers: numbersFrom(values),
    activeIngredient: chemical?.activeIngredient ?? '',
    rateUnit: chemical?.rateUnit ?? '',
  };
}

/** A new step of a kind, in a season (or the kind's first allowed one) and, if given, one year only. */
export function newStepDraft(kind: StepKind, timing: Timing, year: number | null): StepDraft {
  const allowed = allowedTimings(kind);
  const at = allowed.includes(timing) ? timing : allowed[0];
  return {
    key: newKey('s'),
    kind,
    label: kindInfo[kind].name,
    timing: at,
    scheduleKind: year === null ? 'every-year' : 'year-range',
    efficacyForm: 'mean-sd',
    targets: kindInfo[kind].fields.includes('targets') ? [...targetsAllowedAt(actionPoint(kind, at))] : [],
    numbers: numbersFrom(year === null ? {} : { 'schedule.first': year, 'schedule.last': year }),
    activeIngredient: '',
    rateUnit: '',
  };
}

export function draftFromView(view: StrategyView | null): StrategyDraft {
  if (!view) return { name: '', description: '', fieldId: null, steps: [], maxRates: [] };
  return {
    name: view.strategy.name,
    description: view.description,
    fieldId: view.fieldId,
    steps: view.strategy.steps.map(stepDraftFrom),
    maxRates: view.maxRates.map((r) => ({
      key: newKey('r'),
      activeIngredient: r.activeIngredient,
      crop: r.crop,
      maxRate: String(r.maxRate),
      rateUnit: r.rateUnit,
    })),
  };
}

export const has = (step: { kind: StepKind }, field: KindField) => kindInfo[step.kind].fields.includes(field);

const stepPath = (key: string, rel: string) => `steps.${key}${rel === '' ? '' : `.${rel}`}`;

/** The step's schedule as numbers, or null while one of its numbers is not valid. */
export function readSchedule(step: StepDraft): Schedule | null {
  const n = (k: StepNumberKey) => readNumber(stepCatalogueKey(k), step.numbers[k]).value;
  if (step.scheduleKind === 'every-year') return { kind: 'every-year' };
  if (step.scheduleKind === 'every-k-years') {
    const k = n('schedule.k');
    const start = n('schedule.start');
    return k === undefined || start === undefined ? null : { kind: 'every-k-years', k, start };
  }
  const first = n('schedule.first');
  const last = n('schedule.last');
  return first === undefined || last === undefined ? null : { kind: 'year-range', first, last };
}

function buildStep(step: StepDraft, errors: Record<string, string>): Step {
  const value = (k: StepNumberKey, optional = false): number => {
    const read = readNumber(stepCatalogueKey(k), step.numbers[k], optional);
    if (read.error) errors[stepPath(step.key, k)] = read.error;
    return read.value ?? Number.NaN;
  };
  const schedule: Schedule =
    step.scheduleKind === 'every-year'
      ? { kind: 'every-year' }
      : step.scheduleKind === 'every-k-years'
        ? { kind: 'every-k-years', k: value('schedule.k'), start: value('schedule.start') }
        : { kind: 'year-range', first: value('schedule.first'), last: value('schedule.last') };
  const efficacy =
    step.efficacyForm === 'mean-sd'
      ? { mean: value('efficacy.mean'), sd: value('efficacy.sd') }
      : { min: value('efficacy.min'), mode: value('efficacy.mode'), max: value('efficacy.max') };
  const common = {
    label: step.label,
    timing: step.timing,
    schedule,
    efficacy,
    cost: { material: value('cost.material'), application: value('cost.application') },
  };
  const extra: Record<string, unknown> = {};
  if (has(step, 'targets')) extra.targets = step.targets;
  for (const k of [
    'topKill',
    'burial',
    'exhumation',
    'fragmentsPerPlant',
    'seedsPerPlantReduction',
    'seedReturnReduction',
  ] as const) {
    if (has(step, k)) extra[k] = value(k);
  }
  if (has(step, 'chemical')) {
    const rate = value('chemical.rate', true);
    const ingredient = step.activeIngredient;
    const unit = step.rateUnit.trim();
    // Nothing entered means no chemical details; anything entered is checked as a whole.
    if (ingredient.trim() !== '' || unit !== '' || step.numbers['chemical.rate'].text.trim() !== '') {
      extra.chemical = {
        activeIngredient: ingredient,
        ...(Number.isNaN(rate) ? {} : { rate }),
        ...(unit === '' ? {} : { rateUnit: unit }),
      };
    }
  }
  return { kind: step.kind, ...common, ...extra } as Step;
}

/** Where the server's index paths point in the draft: "strategy.steps[2].cost.material" → "steps.s7.cost.material". */
export function draftPaths(fields: Record<string, string>, draft: StrategyDraft): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(fields)) {
    const step = /^strategy\.steps\[(\d+)\]\.?(.*)$/.exec(path);
    const rate = /^maxRates\[(\d+)\]\.?(.*)$/.exec(path);
    if (step && draft.steps[Number(step[1])])
      out[stepPath(draft.steps[Number(step[1])].key, step[2])] = message;
    else if (rate && draft.maxRates[Number(rate[1])])
      out[`maxRates.${draft.maxRates[Number(rate[1])].key}.${rate[2]}`] = message;
    else out[path] = message;
  }
  return out;
}

export function buildStrategy(draft: StrategyDraft): Built<StrategyBody> {
  const errors: Record<string, string> = {};
  const steps = draft.steps.map((s) => buildStep(s, errors));
  // Steps with a refused number are not checked further: their cross-field rules would
  // only repeat the same problem in other words.
  const refused = new Set(
    draft.steps
      .filter((s) => Object.keys(errors).some((p) => p.startsWith(`steps.${s.key}.`)))
      .map((s) => s.key),
  );
  steps.forEach((step, i) => {
    const s = step.schedule;
    if (s.kind === 'year-range' && !refused.has(draft.steps[i].key) && s.first > s.last)
      errors[stepPath(draft.steps[i].key, 'schedule.last')] =
        `last year ${s.last} is before first year ${s.first}`;
  });
  const maxRates = draft.maxRates.map((r) => {
    const typed = parseTyped(r.maxRate);
    const candidate = {
      activeIngredient: r.activeIngredient,
      crop: r.crop,
      maxRate: typed === null ? undefined : typed,
      rateUnit: r.rateUnit,
    };
    const parsed = recordedMaxRate.safeParse(candidate);
    if (!parsed.success) {
      for (const issue of parsed.error.issues)
        errors[`maxRates.${r.key}.${formatPath(issue.path, '')}`] ??= issue.message;
      return null;
    }
    return parsed.data;
  });
  if (draft.description.length > 2000) errors.description = 'Description must be at most 2,000 characters';

  // The schema's own rules: names, timings a kind allows, reachable targets, efficacy spreads, rate with unit.
  const parsed = strategySchema.safeParse({ name: draft.name, steps });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const [head, index, ...rest] = issue.path;
      let path: string;
      if (head === 'steps' && typeof index === 'number' && draft.steps[index]) {
        if (refused.has(draft.steps[index].key)) continue;
        path = stepPath(draft.steps[index].key, formatPath(rest, ''));
      } else {
        path = formatPath(['strategy', ...issue.path]);
      }
      errors[path] ??= issue.message;
    }
  }
  if (Object.keys(errors).length > 0 || !parsed.success) return { body: null, errors };
  return {
    body: {
      strategy: parsed.data,
      description: draft.description,
      fieldId: draft.fieldId,
      maxRates: maxRates.filter((r) => r !== null),
    },
    errors,
  };
}

/** Messages of one step, by path inside the step ("efficacy.mean"). */
export function stepErrors(errors: Record<string, string>, key: string): Record<string, string> {
  const prefix = `steps.${key}`;
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(errors)) {
    if (path === prefix) out[''] = message;
    else if (path.startsWith(`${prefix}.`)) out[path.slice(prefix.length + 1)] = message;
  }
  return out;
}

/** A copy placed right after the original, to repeat the step at another time. */
export function repeatStep(step: StepDraft): StepDraft {
  return { ...step, key: newKey('s'), targets: [...step.targets], numbers: { ...step.numbers } };
}

/** Sets a schedule's years from numbers (used by moves), keeping the kind. */
export function withSchedule(step: StepDraft, schedule: Schedule): StepDraft {
  const numbers = { ...step.numbers };
  if (schedule.kind === 'every-k-years') {
    numbers['schedule.k'] = draftOf(schedule.k);
    numbers['schedule.start'] = draftOf(schedule.start);
  }
  if (schedule.kind === 'year-range') {
    numbers['schedule.first'] = draftOf(schedule.first);
    numbers['schedule.last'] = draftOf(schedule.last);
  }
  return { ...step, scheduleKind: schedule.kind, numbers };
}

/**
 * Moves a step to another season. Flowering plants cannot be reached by spring steps,
 * so a move into spring drops that target (and says so) rather than leaving a step the
 * engine would refuse.
 */
export function withTiming(step: StepDraft, timing: Timing): { step: StepDraft; dropped: TargetStage[] } {
  if (!has(step, 'targets')) return { step: { ...step, timing }, dropped: [] };
  const reachable = targetsAllowedAt(actionPoint(step.kind, timing));
  const kept = step.targets.filter((t) => reachable.includes(t));
  const dropped = step.targets.filter((t) => !reachable.includes(t));
  return { step: { ...step, timing, targets: kept.length > 0 ? kept : [...reachable] }, dropped };
}
