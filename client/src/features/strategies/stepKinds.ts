import type { StepKind, TargetStage, Timing } from '../../../../models/scenario/types';

/*
 * How the builder names and explains each step kind and season. What each kind may do
 * and when (timings, target stages, chemical details) comes from the engine's own
 * models/scenario/step-kinds.ts; this file holds only the words and the grouping.
 */

/** Which part of the plant's life a kind works on; it picks the glyph colours on the timeline. */
export type StepFamily = 'chemical' | 'hands-and-machines' | 'seed' | 'cover';

/** The kind-specific numbers a step of that kind carries, besides efficacy, schedule and cost. */
export type KindField =
  | 'targets'
  | 'topKill'
  | 'burial'
  | 'exhumation'
  | 'fragmentsPerPlant'
  | 'seedsPerPlantReduction'
  | 'seedReturnReduction'
  | 'chemical';

type KindInfo = {
  name: string;
  family: StepFamily;
  summary: string;
  /** What the efficacy fraction means for this kind. */
  efficacy: string;
  fields: readonly KindField[];
};

export const kindInfo: Record<StepKind, KindInfo> = {
  'pre-emergence-herbicide': {
    name: 'Pre-emergence herbicide',
    family: 'chemical',
    summary: 'A residual herbicide in the soil that kills seedlings as they emerge.',
    efficacy: 'Fraction of emerging seedlings the herbicide kills.',
    fields: ['chemical'],
  },
  'post-emergence-herbicide': {
    name: 'Post-emergence herbicide',
    family: 'chemical',
    summary: 'Sprayed on standing plants; some survivors are only top-killed and regrow from the root crown.',
    efficacy: 'Fraction of the targeted plants the herbicide kills.',
    fields: ['targets', 'topKill', 'chemical'],
  },
  'spot-treatment': {
    name: 'Spot treatment',
    family: 'chemical',
    summary: 'Herbicide put on single plants or patches.',
    efficacy: 'Fraction of the targeted plants the treatment kills.',
    fields: ['targets', 'topKill', 'chemical'],
  },
  mowing: {
    name: 'Mowing or shoot removal',
    family: 'hands-and-machines',
    summary: 'Cutting shoots before seed set so flowering plants set fewer seeds; root crowns survive.',
    efficacy: 'How completely the cut succeeds; it scales the cuts in seeds per plant and seed return.',
    fields: ['seedsPerPlantReduction', 'seedReturnReduction'],
  },
  'hand-removal-with-crown': {
    name: 'Hand removal with the root crown',
    family: 'hands-and-machines',
    summary: 'Digging plants out with the part of the root crown that regrows: a kill.',
    efficacy: 'Fraction of the targeted plants dug out and killed.',
    fields: ['targets'],
  },
  'hand-removal-leaving-crown': {
    name: 'Hand removal leaving the crown',
    family: 'hands-and-machines',
    summary: 'Pulling shoots but leaving the root crown, so plants can regrow.',
    efficacy: 'Fraction of the targeted plants top-killed; they regrow at the profile’s root-crown regrowth.',
    fields: ['targets'],
  },
  cultivation: {
    name: 'Cultivation',
    family: 'hands-and-machines',
    summary:
      'Tillage kills plants, moves seed between the layers and can cut roots into fragments that establish.',
    efficacy: 'Fraction of the targeted plants the cultivation kills.',
    fields: ['targets', 'burial', 'exhumation', 'fragmentsPerPlant'],
  },
  mulch: {
    name: 'Mulch',
    family: 'cover',
    summary: 'A mulch layer that stops seedlings from emerging.',
    efficacy: 'Fraction of emerging seedlings the mulch stops.',
    fields: [],
  },
  'seed-set-prevention': {
    name: 'Seed-set prevention',
    family: 'seed',
    summary: 'Removing or destroying seed heads before the seed ripens.',
    efficacy:
      'How completely the seed heads are dealt with; it scales the cuts in seeds per plant and seed return.',
    fields: ['seedsPerPlantReduction', 'seedReturnReduction'],
  },
  'crop-competition': {
    name: 'Crop competition',
    family: 'cover',
    summary: 'A denser or faster crop that shades the weed and cuts its seed production.',
    efficacy: 'Fraction by which the crop cuts seeds per flowering weed plant.',
    fields: [],
  },
};

/** The order kinds are offered in when adding a step: by what they act on. */
export const kindGroups: { title: string; kinds: StepKind[] }[] = [
  { title: 'Herbicides', kinds: ['pre-emergence-herbicide', 'post-emergence-herbicide', 'spot-treatment'] },
  {
    title: 'By hand and machine',
    kinds: ['hand-removal-with-crown', 'hand-removal-leaving-crown', 'mowing', 'cultivation'],
  },
  { title: 'Seed and cover', kinds: ['seed-set-prevention', 'mulch', 'crop-competition'] },
];

export const timingInfo: Record<Timing, { name: string; short: string; detail: string }> = {
  'dormant-early-spring': {
    name: 'Dormant season / early spring',
    short: 'Dormant',
    detail: 'Before emergence: residual herbicides and mulch act on the seedlings to come.',
  },
  spring: { name: 'Spring', short: 'Spring', detail: 'Seedlings and rosettes are up; nothing flowers yet.' },
  summer: { name: 'Summer', short: 'Summer', detail: 'Plants flower: the time to stop seed set.' },
  'late-summer': {
    name: 'Late summer',
    short: 'Late summer',
    detail: 'Seed heads ripen; regrowth after a cut can still set seed.',
  },
  fall: {
    name: 'Fall',
    short: 'Fall',
    detail: 'After seed rain: survivors, tillage, and seed moved between layers.',
  },
};

export const targetNames: Record<TargetStage, string> = {
  seedlings: 'Seedlings',
  rosettes: 'Rosettes',
  flowering: 'Flowering plants',
};
