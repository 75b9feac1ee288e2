// What each kind of management step is allowed to do and when it acts. Shared by the
// schema (which rejects impossible combinations) and the life cycle (which slots each
// step into its place in the year), so the two cannot disagree.
import type { StepKind, TargetStage, Timing } from './types';

export const stepKinds = [
  'pre-emergence-herbicide',
  'post-emergence-herbicide',
  'spot-treatment',
  'mowing',
  'hand-removal-with-crown',
  'hand-removal-leaving-crown',
  'cultivation',
  'mulch',
  'seed-set-prevention',
  'crop-competition',
] as const satisfies readonly StepKind[];

export const timings = [
  'dormant-early-spring',
  'spring',
  'summer',
  'late-summer',
  'fall',
] as const satisfies readonly Timing[];

export const targetStages = ['seedlings', 'rosettes', 'flowering'] as const satisfies readonly TargetStage[];

/**
 * The points of the year at which steps act (see models/lifecycle/year.ts):
 * pre-emergence (life-cycle stage 2), post-emergence (4), seed set (6),
 * seed production (7, crop competition), fall and dormant season (9).
 */
export type ActionPoint = 'pre-emergence' | 'post-emergence' | 'seed-set' | 'seed-production' | 'fall';

/** Kinds that kill plants (and, for cultivation, move seeds); they act wherever their timing puts them. */
export type RemovalKind =
  | 'post-emergence-herbicide'
  | 'spot-treatment'
  | 'hand-removal-with-crown'
  | 'hand-removal-leaving-crown'
  | 'cultivation';

const removalKinds: ReadonlySet<StepKind> = new Set<StepKind>([
  'post-emergence-herbicide',
  'spot-treatment',
  'hand-removal-with-crown',
  'hand-removal-leaving-crown',
  'cultivation',
]);

export function isRemovalKind(kind: StepKind): kind is RemovalKind {
  return removalKinds.has(kind);
}

/** Kinds that carry pesticide details and the label cautions. */
export const chemicalKinds: readonly StepKind[] = [
  'pre-emergence-herbicide',
  'post-emergence-herbicide',
  'spot-treatment',
];

/** Timings each kind accepts: a pre-emergence step must precede emergence, seed-set steps need flowering plants. */
export function allowedTimings(kind: StepKind): readonly Timing[] {
  switch (kind) {
    case 'pre-emergence-herbicide':
    case 'mulch':
      return ['dormant-early-spring', 'spring'];
    case 'mowing':
    case 'seed-set-prevention':
      return ['summer', 'late-summer'];
    default:
      return timings;
  }
}

/** Where in the year a step acts, given its kind and (valid) timing. */
export function actionPoint(kind: StepKind, timing: Timing): ActionPoint {
  if (kind === 'pre-emergence-herbicide' || kind === 'mulch') return 'pre-emergence';
  if (kind === 'crop-competition') return 'seed-production';
  if (kind === 'mowing' || kind === 'seed-set-prevention') return 'seed-set';
  if (timing === 'dormant-early-spring' || timing === 'spring') return 'post-emergence';
  if (timing === 'summer' || timing === 'late-summer') return 'seed-set';
  return 'fall';
}

/** Flowering plants exist only from the flowering stage on, so spring steps cannot target them. */
export function targetsAllowedAt(point: ActionPoint): readonly TargetStage[] {
  return point === 'post-emergence' ? ['seedlings', 'rosettes'] : targetStages;
}
