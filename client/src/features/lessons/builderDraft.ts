// The lesson builder's draft: every number kept as typed (with the unit system it was
// typed in), per template, so switching templates or units loses nothing. Building the
// body reads each number with the catalogue's checks, then validates the whole lesson
// with the same zod schema the server uses, so messages land on the same field paths.
import {
  lessonBody,
  type LessonBody,
  type LessonDefinition,
  type LessonView,
} from '../../../../shared/api/lessons';
import { lessonTemplates, templateSpecs, type LessonTemplate } from '../../../../shared/lessons/templates';
import type { ParameterKey } from '../../../../shared/scenario/parameters';
import { formatPath } from '../../../../shared/scenario/parse';
import { draftOf, readNumber, type NumberDraft } from '../../shared/lib/parameterDraft';

export type SliderDraft = Record<'min' | 'max' | 'step' | 'value', NumberDraft>;

/** The fixed settings a template has besides its sliders, and the catalogue entry each reads as. */
export const fixedSettings = {
  horizonYears: 'horizonYears',
  initialSeedbank: 'field.initialSeedbank.shallow',
  initialPlants: 'field.initialPlants',
  replicates: 'replicates',
  seed: 'seed',
} as const satisfies Record<string, ParameterKey>;
export type FixedKey = keyof typeof fixedSettings;

export const fixedKeysOf = (template: LessonTemplate): FixedKey[] =>
  template === 'seedbank-decay'
    ? ['horizonYears', 'initialSeedbank', 'replicates', 'seed']
    : template === 'one-year-seed-set'
      ? ['horizonYears', 'initialPlants', 'replicates', 'seed']
      : ['horizonYears', 'initialSeedbank', 'initialPlants', 'replicates', 'seed'];

export type TemplateDraft = {
  fixed: Record<FixedKey, NumberDraft>;
  scale: 'linear' | 'log';
  sliders: Record<string, SliderDraft>;
};

export type BuilderDraft = {
  template: LessonTemplate;
  title: string;
  /** '' for none. */
  profileId: string;
  prompts: string[];
  settings: Record<LessonTemplate, TemplateDraft>;
};

const startFixed: Record<LessonTemplate, { initialSeedbank: number; initialPlants: number }> = {
  'seedbank-decay': { initialSeedbank: 1000, initialPlants: 0 },
  // A field near depletion: a few plants left.
  'one-year-seed-set': { initialSeedbank: 5, initialPlants: 0.01 },
  'annual-vs-perennial': { initialSeedbank: 500, initialPlants: 2 },
  'which-stage': { initialSeedbank: 500, initialPlants: 2 },
};

function templateDraft(template: LessonTemplate): TemplateDraft {
  const spec = templateSpecs[template];
  return {
    fixed: {
      horizonYears: draftOf(spec.horizon.start),
      initialSeedbank: draftOf(startFixed[template].initialSeedbank),
      initialPlants: draftOf(startFixed[template].initialPlants),
      replicates: draftOf(200),
      seed: draftOf(1),
    },
    scale: 'linear',
    sliders: Object.fromEntries(
      Object.entries(spec.sliders).map(([k, s]) => [
        k,
        {
          min: draftOf(s.start.min),
          max: draftOf(s.start.max),
          step: draftOf(s.start.step),
          value: draftOf(s.start.value),
        },
      ]),
    ),
  };
}

export function newDraft(): BuilderDraft {
  return {
    template: 'seedbank-decay',
    title: '',
    profileId: '',
    prompts: [''],
    settings: Object.fromEntries(
      lessonTemplates.map((t) => [t, templateDraft(t)]),
    ) as BuilderDraft['settings'],
  };
}

/** A saved lesson as a draft; the other templates start fresh. */
export function draftFromLesson(view: LessonView): BuilderDraft {
  const draft = newDraft();
  const def = view.definition;
  const s = def.settings as LessonDefinition['settings'] &
    Partial<Record<'initialSeedbank' | 'initialPlants', number>>;
  const own = draft.settings[def.template];
  for (const key of fixedKeysOf(def.template)) own.fixed[key] = draftOf(s[key]);
  if (def.template === 'seedbank-decay') own.scale = def.settings.scale;
  for (const [k, slider] of Object.entries(
    def.settings.sliders as Record<string, Record<keyof SliderDraft, number>>,
  ))
    own.sliders[k] = {
      min: draftOf(slider.min),
      max: draftOf(slider.max),
      step: draftOf(slider.step),
      value: draftOf(slider.value),
    };
  return {
    ...draft,
    template: def.template,
    title: view.title,
    profileId: view.profileId ?? '',
    prompts: view.prompts.length ? view.prompts.map((p) => p.markdown) : [''],
  };
}

export type Built = { body: LessonBody | null; errors: Record<string, string> };

/** The request body, or the message for each field that needs a look (keyed by its body path). */
export function buildBody(draft: BuilderDraft): Built {
  const errors: Record<string, string> = {};
  const own = draft.settings[draft.template];
  const read = (path: string, key: ParameterKey, d: NumberDraft) => {
    const r = readNumber(key, d);
    if (r.error) errors[path] = r.error;
    return r.value;
  };
  const settings: Record<string, unknown> = {};
  for (const key of fixedKeysOf(draft.template))
    settings[key] = read(`definition.settings.${key}`, fixedSettings[key], own.fixed[key]);
  if (draft.template === 'seedbank-decay') settings.scale = own.scale;
  const sliders: Record<string, Record<string, number | undefined>> = {};
  for (const [k, spec] of Object.entries(templateSpecs[draft.template].sliders)) {
    const d = own.sliders[k];
    sliders[k] = {};
    for (const part of ['min', 'max', 'step', 'value'] as const)
      sliders[k][part] = read(`definition.settings.sliders.${k}.${part}`, spec.parameter, d[part]);
  }
  settings.sliders = sliders;
  if (Object.keys(errors).length) return { body: null, errors };
  const parsed = lessonBody.safeParse({
    title: draft.title,
    profileId: draft.profileId === '' ? null : draft.profileId,
    prompts: draft.prompts.map((p) => p.trim()).filter((p) => p !== ''),
    definition: { template: draft.template, settings },
  });
  if (parsed.success) return { body: parsed.data, errors };
  for (const issue of parsed.error.issues) errors[formatPath(issue.path, 'body')] ??= issue.message;
  return { body: null, errors };
}
