// Parameter paths into a scenario, written as the scenario's validation messages write them
// ("profile.seedDecay.deep", "strategy.steps[1].efficacy.mean"), read and set on plain data.

export type PathSegment = string | number;

const SEGMENT = /([^.[\]]+)|\[(\d+)\]/g;

/** "strategy.steps[1].efficacy.mean" → ["strategy", "steps", 1, "efficacy", "mean"]. */
export function pathSegments(path: string): PathSegment[] {
  const out: PathSegment[] = [];
  for (const m of path.matchAll(SEGMENT)) out.push(m[2] !== undefined ? Number(m[2]) : m[1]);
  return out;
}

/** The value at a path, or undefined when any step of it is missing. */
export function valueAt(root: unknown, path: string): unknown {
  let node: unknown = root;
  for (const key of pathSegments(path)) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<PathSegment, unknown>)[key];
  }
  return node;
}

/**
 * A deep copy of `root` with each path set to its value. Every path must already hold a
 * number (the sweep's parameter list is made of such paths), so no new field can appear.
 */
export function withValues<T>(root: T, paths: readonly string[], values: readonly number[]): T {
  const copy = structuredClone(root);
  paths.forEach((path, i) => {
    const segments = pathSegments(path);
    let node = copy as unknown as Record<PathSegment, unknown>;
    for (const key of segments.slice(0, -1)) node = node[key] as Record<PathSegment, unknown>;
    const last = segments[segments.length - 1];
    if (typeof node?.[last] !== 'number') throw new RangeError(`${path} is not a number in this scenario`);
    node[last] = values[i];
  });
  return copy;
}
