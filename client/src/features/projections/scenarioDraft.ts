import type { ScenarioBody, ScenarioView } from '../../../../shared/api/scenarios';
import { parameterCatalogue, type NumericParameter } from '../../../../shared/scenario/parameters';
import type { Built } from '../../shared/lib/draftForm';
import {
  draftOf,
  formatNumber,
  parseTyped,
  readNumber,
  type NumberDraft,
} from '../../shared/lib/parameterDraft';

/*
 * A scenario as it is being edited. Numbers stay as typed (with the unit system they
 * were typed in, so the depletion threshold converts between seeds/m² and seeds/ft²).
 * The discount rate is typed in percent, as rates are usually quoted, and stored as a
 * fraction. Errors are keyed by the server's paths ("horizonYears", "strategyIds").
 */

export const MAX_STRATEGIES = 6;

export const scenarioNumberKeys = ['horizonYears', 'replicates', 'seed', 'depletionThreshold'] as const;
export type ScenarioNumberKey = (typeof scenarioNumberKeys)[number];

export type ScenarioDraft = {
  name: string;
  fieldId: string;
  profileId: string;
  /** In the order they are compared. */
  strategyIds: string[];
  efficacyDraw: ScenarioBody['efficacyDraw'];
  numbers: Record<ScenarioNumberKey, NumberDraft>;
  /** The discount rate in % per year, as typed. */
  discountPercent: string;
};

const percentText = (fraction: number) => String(Number((fraction * 100).toPrecision(12)));

export function scenarioDraft(
  scenario: ScenarioView | undefined,
  defaults: { fieldId: string; profileId: string; seed: number },
): ScenarioDraft {
  const c = parameterCatalogue;
  return {
    name: scenario?.name ?? '',
    fieldId: scenario?.fieldId ?? defaults.fieldId,
    profileId: scenario?.profileId ?? defaults.profileId,
    strategyIds: scenario?.strategyIds ?? [],
    efficacyDraw: scenario?.efficacyDraw ?? 'per-replicate',
    numbers: {
      horizonYears: draftOf(scenario?.horizonYears ?? c.horizonYears.default),
      replicates: draftOf(scenario?.replicates ?? c.replicates.default),
      seed: draftOf(scenario?.seed ?? defaults.seed),
      depletionThreshold: draftOf(scenario?.depletionThreshold ?? c.depletionThreshold.default),
    },
    discountPercent: percentText(scenario?.discountRate ?? c.discountRate.default),
  };
}

/** The discount rate parameter restated in % per year. */
export const discountInPercent: NumericParameter = {
  ...parameterCatalogue.discountRate,
  unit: '% per year',
  min: parameterCatalogue.discountRate.min * 100,
  max: parameterCatalogue.discountRate.max * 100,
  default: parameterCatalogue.discountRate.default * 100,
};

function readPercent(text: string): { value?: number; error?: string } {
  const p = discountInPercent;
  const range = `${formatNumber(p.min)}–${formatNumber(p.max)} (${p.unit})`;
  const typed = parseTyped(text);
  if (typed === null) return { error: `is required: a number ${range}` };
  if (Number.isNaN(typed)) return { error: `"${text.trim()}" is not a number; expected ${range}` };
  if (typed < p.min || typed > p.max) return { error: `${text.trim()} is outside ${range}` };
  return { value: Number((typed / 100).toPrecision(12)) };
}

export function buildScenario(draft: ScenarioDraft): Built<ScenarioBody> {
  const errors: Record<string, string> = {};
  if (draft.name.trim() === '') errors.name = 'Give the scenario a name';
  if (draft.fieldId === '') errors.fieldId = 'Pick a field';
  if (draft.profileId === '') errors.profileId = 'Pick a species profile';
  if (draft.strategyIds.length === 0) errors.strategyIds = 'Pick at least one strategy to compare';
  if (draft.strategyIds.length > MAX_STRATEGIES)
    errors.strategyIds = `Compare at most ${MAX_STRATEGIES} strategies`;
  const numbers = {} as Record<ScenarioNumberKey, number>;
  for (const key of scenarioNumberKeys) {
    const read = readNumber(key, draft.numbers[key]);
    if (read.error) errors[key] = read.error;
    else numbers[key] = read.value!;
  }
  const discount = readPercent(draft.discountPercent);
  if (discount.error) errors.discountRate = discount.error;
  if (Object.keys(errors).length > 0) return { body: null, errors };
  return {
    body: {
      name: draft.name.trim(),
      fieldId: draft.fieldId,
      profileId: draft.profileId,
      strategyIds: draft.strategyIds,
      horizonYears: numbers.horizonYears,
      replicates: numbers.replicates,
      seed: numbers.seed,
      efficacyDraw: draft.efficacyDraw,
      depletionThreshold: numbers.depletionThreshold,
      discountRate: discount.value!,
    },
    errors,
  };
}

/** "strategyIds[1]" → "strategyIds"; other paths are the draft's own. */
export function scenarioServerErrors(fields: Record<string, string>): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const [path, message] of Object.entries(fields)) errors[path.replace(/\[\d+\]$/, '')] ??= message;
  return errors;
}
