import { z } from 'zod';
import { profileSchema } from '../scenario/schema';
import { numberField } from '../scenario/fields';
import { parameterCatalogue } from '../scenario/parameters';
import {
  lessonTemplates,
  replayLimits,
  sliderSpec,
  templateSpecs,
  type LessonTemplate,
  type SliderSpec,
} from '../lessons/templates';
import { classCardView, speciesCardView } from './species-cards';
import { idParam } from './workspaces';

const num = (what: string) =>
  z.number({
    error: (iss) => (iss.input === undefined ? `${what} is required` : `${what} must be a number`),
  });

/**
 * A slider as the teacher fixes it. Its range stays inside the widest range the template
 * allows (itself inside the parameter's valid range), and the starting value inside it.
 */
function sliderField(spec: SliderSpec) {
  const unit = parameterCatalogue[spec.parameter].unit;
  const allowed = `${spec.bounds.min}–${spec.bounds.max} (${unit})`;
  return z
    .strictObject({ min: num('min'), max: num('max'), step: num('step'), value: num('value') })
    .check((ctx) => {
      const s = ctx.value;
      const push = (path: string, message: string) =>
        ctx.issues.push({ code: 'custom', input: s, path: [path], message });
      for (const key of ['min', 'max', 'value'] as const) {
        const v = s[key];
        if (v < spec.bounds.min || v > spec.bounds.max) push(key, `${v} is outside ${allowed}`);
        else if (spec.integer && !Number.isInteger(v)) push(key, `${v} is not a whole number (${unit})`);
      }
      if (!(s.min < s.max)) push('max', `must be above the lowest value ${s.min}`);
      else if (s.value < s.min || s.value > s.max)
        push('value', `${s.value} is outside the slider's range ${s.min}–${s.max}`);
      if (!(s.step > 0) || s.step > s.max - s.min)
        push('step', `must be above 0 and at most the range ${s.max - s.min}`);
      else if (spec.integer && !Number.isInteger(s.step)) push('step', `${s.step} is not a whole number`);
    });
}

function slidersOf<T extends LessonTemplate>(template: T) {
  const shape: Record<string, ReturnType<typeof sliderField>> = {};
  for (const [key, spec] of Object.entries(templateSpecs[template].sliders)) shape[key] = sliderField(spec);
  return z.strictObject(
    shape as { [K in keyof (typeof templateSpecs)[T]['sliders']]: ReturnType<typeof sliderField> },
  );
}

function horizonField(template: LessonTemplate) {
  const { min, max } = templateSpecs[template].horizon;
  const message =
    template === 'seedbank-decay'
      ? // Common practice, no published source: buried seed stays viable for more than 40 years.
        `must be ${min}–${max} years: buried seed can stay viable for more than 40 years, so the axis reaches at least ${min}`
      : `must be ${min}–${max} years`;
  return z
    .number({ error: `Horizon ${message}` })
    .int(`Horizon ${message}`)
    .min(min, message)
    .max(max, message);
}

const replicates = z
  .number({ error: 'Replicates must be a whole number' })
  .int('Replicates must be a whole number')
  .min(10, 'Replay at least 10 replicates')
  .max(
    replayLimits.maxReplicates,
    `At most ${replayLimits.maxReplicates} replicates, so a replay stays quick`,
  );
const initialPlants = numberField('field.initialPlants');
const chance = { replicates, seed: numberField('seed') };

const decaySettings = z.strictObject({
  horizonYears: horizonField('seedbank-decay'),
  initialSeedbank: num('Seedbank at the start')
    .min(1, 'must be at least 1 seed/m²')
    .max(1_000_000, 'must be at most 1,000,000 seeds/m²'),
  scale: z.enum(['linear', 'log'], { error: 'Scale must be linear or log' }),
  ...chance,
  sliders: slidersOf('seedbank-decay'),
});

const seedSetSettings = z
  .strictObject({
    horizonYears: horizonField('one-year-seed-set'),
    initialPlants,
    ...chance,
    sliders: slidersOf('one-year-seed-set'),
  })
  .check((ctx) => {
    const { horizonYears, sliders } = ctx.value;
    // The seedbank needs years after the seeding year to come back.
    if (sliders.seedYear.max > horizonYears - 1) {
      ctx.issues.push({
        code: 'custom',
        input: sliders.seedYear.max,
        path: ['sliders', 'seedYear', 'max'],
        message: `must be at most ${horizonYears - 1}, a year before the horizon`,
      });
    }
  });

const stageSettings = (template: 'annual-vs-perennial' | 'which-stage') =>
  z.strictObject({
    horizonYears: horizonField(template),
    initialSeedbank: numberField('field.initialSeedbank.shallow'),
    initialPlants,
    ...chance,
    sliders: slidersOf(template),
  });

/** What the lesson page runs: the template and the settings the teacher fixed. */
export const lessonDefinition = z.discriminatedUnion(
  'template',
  [
    z.strictObject({ template: z.literal('seedbank-decay'), settings: decaySettings }),
    z.strictObject({ template: z.literal('one-year-seed-set'), settings: seedSetSettings }),
    z.strictObject({
      template: z.literal('annual-vs-perennial'),
      settings: stageSettings('annual-vs-perennial'),
    }),
    z.strictObject({ template: z.literal('which-stage'), settings: stageSettings('which-stage') }),
  ],
  { error: `Pick a template: one of ${lessonTemplates.join(', ')}` },
);
export type LessonDefinition = z.infer<typeof lessonDefinition>;

/** Prompts and questions for the class, in Markdown; rendered and sanitised by the server. */
export const lessonPrompts = z
  .array(
    z
      .string()
      .trim()
      .min(1, 'A prompt cannot be empty')
      .max(2000, 'A prompt must be at most 2,000 characters'),
  )
  .max(12, 'At most 12 prompts');

export const lessonBody = z
  .strictObject({
    title: z
      .string()
      .trim()
      .min(1, 'Give the lesson a title')
      .max(120, 'A title must be at most 120 characters'),
    profileId: idParam.nullable().default(null),
    prompts: lessonPrompts.default([]),
    definition: lessonDefinition,
  })
  .check((ctx) => {
    const { profileId, definition } = ctx.value;
    if (templateSpecs[definition.template].needsProfile && profileId === null) {
      ctx.issues.push({
        code: 'custom',
        input: profileId,
        path: ['profileId'],
        message: `${templateSpecs[definition.template].name} runs on a species profile: pick one`,
      });
    }
  });
export type LessonBody = z.infer<typeof lessonBody>;

export const lessonParams = z.strictObject({ workspaceId: idParam, lessonId: idParam });

/** A prompt as the page shows it: the teacher's Markdown and its sanitised HTML. */
export const renderedPrompt = z.object({ markdown: z.string(), html: z.string() });

/** The active class link of a lesson; its secret is shown only once, when it is made. */
export const classLinkView = z.object({ prefix: z.string(), createdAt: z.string() });

const lessonProfile = z.object({ name: z.string(), profile: profileSchema });

export const lessonListItem = z.object({
  id: z.string(),
  title: z.string(),
  template: z.enum(lessonTemplates),
  profileId: z.string().nullable(),
  link: classLinkView.nullable(),
  updatedAt: z.string(),
});
export type LessonListItem = z.infer<typeof lessonListItem>;

export const lessonView = lessonListItem.extend({
  prompts: z.array(renderedPrompt),
  definition: lessonDefinition,
  /** The profile's parameters the page runs on, and its species card, when the lesson has a profile. */
  profile: lessonProfile.extend({ id: z.string() }).nullable(),
  card: speciesCardView.nullable(),
});
export type LessonView = z.infer<typeof lessonView>;

/** A new class link: the only answer that carries the token. */
export const createdClassLink = z.object({ token: z.string(), link: classLinkView });
export type CreatedClassLink = z.infer<typeof createdClassLink>;

/** The class link's token: 32 random bytes, base64url. Anything else is simply not found. */
export const classToken = z.string().regex(/^[A-Za-z0-9_-]{43}$/);
export const classParams = z.strictObject({ token: z.string() });
export const classPhotoParams = z.strictObject({ token: z.string(), photoId: idParam });

/** What a signed-out visitor with the link gets: this lesson alone, no ids of the workspace. */
export const classLessonView = z.object({
  title: z.string(),
  prompts: z.array(renderedPrompt.pick({ html: true })),
  definition: lessonDefinition,
  profile: lessonProfile.nullable(),
  card: classCardView.nullable(),
});
export type ClassLessonView = z.infer<typeof classLessonView>;

/** "Replay with chance": the slider values on the page, and the seed of this replay. */
export const replayBody = z.strictObject({
  values: z.record(z.string(), z.number({ error: 'Slider values must be numbers' })),
  seed: numberField('seed'),
});
export type ReplayBody = z.infer<typeof replayBody>;

const band = z.object({
  q05: z.array(z.number()),
  q25: z.array(z.number()),
  q50: z.array(z.number()),
  q75: z.array(z.number()),
  q95: z.array(z.number()),
});
export type ReplayBand = z.infer<typeof band>;

export const replayResponse = z.object({
  seed: z.number(),
  replicates: z.number(),
  years: z.array(z.number()),
  runs: z.array(z.object({ id: z.string(), label: z.string(), seedbankTotal: band, established: band })),
});
export type ReplayResponse = z.infer<typeof replayResponse>;

/** Slider values outside the lesson's own ranges are refused, naming the slider. */
export function checkSliderValues(definition: LessonDefinition, values: Record<string, number>) {
  const fields: Record<string, string> = {};
  const sliders = definition.settings.sliders as Record<string, { min: number; max: number }>;
  for (const key of Object.keys(values))
    if (!(key in sliders)) fields[`values.${key}`] = `This lesson has no slider "${key}"`;
  for (const [key, s] of Object.entries(sliders)) {
    const v = values[key];
    const spec = sliderSpec(definition.template, key)!;
    if (v === undefined) fields[`values.${key}`] = `is required: a number ${s.min}–${s.max}`;
    else if (!(v >= s.min && v <= s.max))
      fields[`values.${key}`] = `${v} is outside the slider's range ${s.min}–${s.max}`;
    else if (spec.integer && !Number.isInteger(v)) fields[`values.${key}`] = `${v} is not a whole number`;
  }
  return fields;
}
