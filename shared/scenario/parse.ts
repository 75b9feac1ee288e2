// Turning untrusted JSON into a Scenario, or into a list of problems a person can act on.
import type { z } from 'zod';
import type { Scenario } from '../../models/scenario/types';
import { scenarioSchema } from './schema';

export interface ScenarioIssue {
  /** Dotted field path, e.g. "profile.seedDecay.shallow" or "strategy.steps[0].kind". */
  path: string;
  /** What is wrong, with the value and the allowed range; reads on its own beside the field. */
  message: string;
}

export type ParseResult = { ok: true; scenario: Scenario } | { ok: false; issues: ScenarioIssue[] };

/** `root` names the whole document when the path is empty. */
export function formatPath(path: readonly PropertyKey[], root = '(scenario)'): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? root : out;
}

/** One line per issue: "path: message". */
export function issueText(issue: ScenarioIssue): string {
  return `${issue.path}: ${issue.message}`;
}

function toIssues(error: z.ZodError): ScenarioIssue[] {
  const issues: ScenarioIssue[] = [];
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      // One entry per unknown key, each at its own path, so the UI can point at it.
      for (const key of issue.keys) {
        issues.push({ path: formatPath([...issue.path, key]), message: `"${key}" is not a known field` });
      }
    } else {
      issues.push({ path: formatPath(issue.path), message: issue.message });
    }
  }
  return issues;
}

export function parseScenario(json: unknown): ParseResult {
  const result = scenarioSchema.safeParse(json);
  if (!result.success) return { ok: false, issues: toIssues(result.error) };
  const scenario: Scenario = result.data;
  return { ok: true, scenario };
}
