import type { z } from 'zod';
import { formatPath } from '../../shared/scenario/parse';
import { invalid } from '../services/errors';

/**
 * Parses a request part with a shared zod schema; failures become a 400 naming each field
 * by its path, written as the scenario schema writes it ("strategy.steps[0].kind").
 */
export function parse<S extends z.ZodType>(schema: S, data: unknown, part = 'body'): z.infer<S> {
  const result = schema.safeParse(data ?? {});
  if (result.success) return result.data;
  const fields: Record<string, string> = {};
  for (const issue of result.error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) fields[formatPath([...issue.path, key], part)] = `Unknown field "${key}"`;
      continue;
    }
    const path = formatPath(issue.path, part);
    fields[path] ??= issue.message;
  }
  const summary = Object.entries(fields)
    .slice(0, 3)
    .map(([k, v]) => `${k}: ${v}`)
    .join('; ');
  throw invalid(`Invalid ${part}: ${summary}`, fields);
}
