// The four lesson templates: what each teaches, which sliders it has and the settings a
// teacher fixes. Each slider names the catalogue parameter it stands for, so the lesson
// page shows the same meaning, unit, valid range and default source as every other form.
import type { ParameterKey } from '../scenario/parameters';

export const lessonTemplates = [
  'seedbank-decay',
  'one-year-seed-set',
  'annual-vs-perennial',
  'which-stage',
] as const;
export type LessonTemplate = (typeof lessonTemplates)[number];

/** A slider as the teacher fixed it: its range, its step and the value it starts at. */
export type Slider = { min: number; max: number; step: number; value: number };

export type SliderSpec = {
  /** The catalogue entry whose meaning, unit, range and default source the slider carries. */
  parameter: ParameterKey;
  label: string;
  /** What the slider does in this lesson, in a sentence. */
  meaning: string;
  /** The widest range a teacher may give it (inside the catalogue's valid range). */
  bounds: { min: number; max: number };
  integer?: boolean;
  /** Where a new lesson starts. */
  start: Slider;
};

export type TemplateSpec = {
  name: string;
  /** One sentence for the template picker. */
  summary: string;
  /** Whether the lesson runs on a species profile (seedbank decay needs only d and g). */
  needsProfile: boolean;
  /** Lesson horizons: the decay lesson reaches at least 40 years (buried seed stays viable that long). */
  horizon: { min: number; max: number; start: number };
  sliders: Record<string, SliderSpec>;
};

/** Replays run on the server with chance, kept small so a class can press the button freely. */
export const replayLimits = { maxReplicates: 200, maxYears: 60 } as const;

const fraction = (value: number, step = 0.01): Slider => ({ min: 0, max: 1, step, value });

export const templateSpecs = {
  'seedbank-decay': {
    name: 'Seedbank decay',
    summary:
      'One cohort of seed in the soil, no new seed: how fast decay and germination empty the seedbank, beside a second cohort.',
    needsProfile: false,
    // Common practice, no published source: dock seed stays viable in soil for more than
    // 40 years, so the axis must reach at least that far.
    horizon: { min: 40, max: replayLimits.maxYears, start: 50 },
    sliders: {
      decay: {
        parameter: 'profile.seedDecay.shallow',
        label: 'Annual seed decay (d), cohort A',
        meaning: 'Share of cohort A’s viable seed that dies in the soil each year.',
        bounds: { min: 0, max: 1 },
        start: fraction(0.12),
      },
      germination: {
        parameter: 'profile.germination.shallowByAge[]',
        label: 'Germination (g), cohort A',
        meaning: 'Share of cohort A’s seed that germinates each year and so leaves the seedbank.',
        bounds: { min: 0, max: 1 },
        start: fraction(0.06),
      },
      compareDecay: {
        parameter: 'profile.seedDecay.deep',
        label: 'Annual seed decay (d), cohort B',
        meaning: 'Share of cohort B’s viable seed that dies each year (buried seed often decays slower).',
        bounds: { min: 0, max: 1 },
        start: fraction(0.04),
      },
      compareGermination: {
        parameter: 'profile.germination.deep',
        label: 'Germination (g), cohort B',
        meaning:
          'Share of cohort B’s seed that germinates each year (buried, light-needing seed hardly does).',
        bounds: { min: 0, max: 1 },
        start: fraction(0),
      },
    },
  },
  'one-year-seed-set': {
    name: 'One year of seed set',
    summary:
      'A field held near depletion lets its plants seed for one year: how many years until the seedbank is back where it was.',
    needsProfile: true,
    horizon: { min: 10, max: replayLimits.maxYears, start: 30 },
    sliders: {
      initialSeedbank: {
        parameter: 'field.initialSeedbank.shallow',
        label: 'Seedbank at the start',
        meaning: 'Viable seeds per m² in the top layer when the lesson starts: a field near depletion.',
        bounds: { min: 0, max: 100_000 },
        start: { min: 1, max: 100, step: 1, value: 5 },
      },
      seedSetControl: {
        parameter: 'strategy.steps[].efficacy.mean',
        label: 'Seed-head removal each year',
        meaning: 'Share of the seed that seed-head removal keeps from reaching the soil, every year but one.',
        bounds: { min: 0, max: 1 },
        start: fraction(0.98),
      },
      plantControl: {
        parameter: 'strategy.steps[].efficacy.mean',
        label: 'Digging out plants with the root crown',
        meaning: 'Share of seedlings and rosettes dug out with their root crown each spring.',
        bounds: { min: 0, max: 1 },
        start: fraction(0.8),
      },
      seedYear: {
        parameter: 'letItSeedYear',
        label: 'The year the plants seed',
        meaning: 'In this year the seed heads are not removed.',
        bounds: { min: 1, max: replayLimits.maxYears - 1 },
        integer: true,
        start: { min: 1, max: 15, step: 1, value: 3 },
      },
    },
  },
  'annual-vs-perennial': {
    name: 'Annual versus perennial',
    summary:
      'The same shoot removal every summer, on plants that regrow from the root crown and on plants that do not.',
    needsProfile: true,
    horizon: { min: 5, max: replayLimits.maxYears, start: 20 },
    sliders: {
      controlEfficacy: {
        parameter: 'strategy.steps[].efficacy.mean',
        label: 'Shoot removal each summer',
        meaning:
          'Share of rosettes and flowering plants whose shoots are pulled or cut in summer, leaving the root crown.',
        bounds: { min: 0, max: 1 },
        start: fraction(0.9),
      },
      rootCrownRegrowth: {
        parameter: 'profile.rootCrownRegrowth',
        label: 'Root-crown regrowth (r) of the perennial',
        meaning: 'Share of plants with their shoots removed that regrow from the root crown.',
        bounds: { min: 0, max: 1 },
        start: fraction(0.9),
      },
    },
  },
  'which-stage': {
    name: 'Which stage to hit',
    summary:
      'λ and its elasticities for a profile, with the same control applied at each life stage in turn.',
    needsProfile: true,
    horizon: { min: 5, max: replayLimits.maxYears, start: 20 },
    sliders: {
      controlEfficacy: {
        parameter: 'strategy.steps[].efficacy.mean',
        label: 'Control efficacy at the stage hit',
        meaning:
          'Share of the stage the control removes: emerging seedlings, rosettes, flowering plants or seed.',
        bounds: { min: 0, max: 1 },
        start: fraction(0.9),
      },
    },
  },
} as const satisfies Record<LessonTemplate, TemplateSpec>;

export type SliderKey<T extends LessonTemplate> = keyof (typeof templateSpecs)[T]['sliders'] & string;

export const sliderKeys = <T extends LessonTemplate>(template: T): SliderKey<T>[] =>
  Object.keys(templateSpecs[template].sliders) as SliderKey<T>[];

export function sliderSpec(template: LessonTemplate, key: string): SliderSpec | undefined {
  return (templateSpecs[template].sliders as Record<string, SliderSpec>)[key];
}
