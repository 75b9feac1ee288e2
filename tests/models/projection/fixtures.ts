// Test scenarios built from the example files and validated by the real schema, so every
// scenario a test runs is one a user could have entered.
import { readFileSync } from 'node:fs';
import { issueText, parseScenario } from '../../../shared/scenario/parse';
import type { Scenario } from '../../../models/scenario/types';

export type ExampleName = 'demo-perennial-dock' | 'annual-goosefoot' | 'lesson-seedbank-decay';

/** Example JSON as tests edit it: freely, into invalid shapes too (that is the point of some tests). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- see above; the schema types it afterwards
export type LooseJson = Record<string, any>;

export function exampleJson(name: ExampleName): LooseJson {
  return JSON.parse(readFileSync(`models/examples/${name}.json`, 'utf8'));
}

/** The example, changed by `edit` (on the raw JSON), then validated. */
export function scenarioFrom(name: ExampleName, edit: (json: LooseJson) => void = () => {}): Scenario {
  const json = exampleJson(name);
  edit(json);
  const parsed = parseScenario(json);
  if (!parsed.ok) throw new Error(`test scenario is invalid:\n${parsed.issues.map(issueText).join('\n')}`);
  return parsed.scenario;
}

/** Row t of replicate r in a block's series. */
export const at = (series: Float64Array, years: number, r: number, t: number) => series[r * (years + 1) + t];
