import type { Scenario, SpeciesProfile, FieldSetting, Strategy } from '../../models/scenario/types';
import { parseScenario } from '../../shared/scenario/parse';
import type { ScenarioRow } from '../db/queries/scenarios';
import { invalid } from './errors';

/** Settings of a saved scenario that go into every projection it launches. */
export type RunSettings = Pick<
  ScenarioRow,
  'horizonYears' | 'replicates' | 'seed' | 'efficacyDraw' | 'depletionThreshold' | 'discountRate'
>;

/** The doing-nothing reference that every comparison is measured against. */
export const noControl = (): Strategy => ({ name: 'No control', steps: [] });

/**
 * Freezes the engine input of one projection and validates it as a whole (e.g. schedule
 * years inside the horizon). Problems name the strategy and the field, for a 400.
 */
export function snapshot(
  profile: SpeciesProfile,
  field: FieldSetting,
  strategy: Strategy,
  settings: RunSettings,
  seed = settings.seed,
  letItSeedYear?: number,
): Scenario {
  const candidate = {
    profile,
    field,
    strategy,
    horizonYears: settings.horizonYears,
    replicates: settings.replicates,
    seed,
    efficacyDraw: settings.efficacyDraw,
    depletionThreshold: settings.depletionThreshold,
    discountRate: settings.discountRate,
    ...(letItSeedYear !== undefined ? { letItSeedYear } : {}),
  };
  const parsed = parseScenario(candidate);
  if (parsed.ok) return parsed.scenario;
  const fields = Object.fromEntries(parsed.issues.map((i) => [`${strategy.name}: ${i.path}`, i.message]));
  throw invalid(
    `"${strategy.name}" cannot run with these settings: ${parsed.issues[0].path}: ${parsed.issues[0].message}`,
    fields,
  );
}
