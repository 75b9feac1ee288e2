import type { ProfileBody } from '../../../../shared/api/profiles';
import { parameterCatalogue, type ParameterKey } from '../../../../shared/scenario/parameters';
import { formatPath } from '../../../../shared/scenario/parse';
import { profileSchema } from '../../../../shared/scenario/schema';
import type { LifeForm, SpeciesProfile } from '../../../../models/scenario/types';
import type { Built } from '../../shared/lib/draftForm';
import { draftOf, readNumber, type NumberDraft } from '../../shared/lib/parameterDraft';

/*
 * A profile as it is being edited: every number kept as typed text, so a rejected value
 * stays in its field. Errors are keyed by the server's own paths ("profile.seedDecay.shallow"),
 * so a message from a save lands beside the same field as a message found while typing.
 */

/** Scalar parameters, by their path inside the profile (the key of their source note too). */
export const scalarKeys = [
  'fecundity.maxSeedsPerPlant',
  'fecundity.densityCoefficient',
  'fecundity.aggregation',
  'germination.deep',
  'seedDecay.shallow',
  'seedDecay.deep',
  'ageClasses',
  'establishment.survival',
  'establishment.density.c',
  'establishment.density.K',
  'floweringProbability',
  'overWinterSurvival',
  'rootCrownRegrowth',
  'fragmentEstablishment',
  'seedRainLoss',
  'environment.germinationCv',
  'environment.establishmentCv',
  'environment.fecundityCv',
] as const;
export type ScalarKey = (typeof scalarKeys)[number];

export const catalogueKey = (key: ScalarKey) => `profile.${key}` as ParameterKey;
export const SHALLOW_BY_AGE = 'germination.shallowByAge';

export type DensityKind = 'beverton-holt' | 'ceiling';

export type ProfileDraft = {
  name: string;
  lifeForm: LifeForm;
  numbers: Record<ScalarKey, NumberDraft>;
  shallowByAge: NumberDraft[];
  densityKind: DensityKind;
  sources: Record<string, string>;
};

export function draftFromProfile(profile: SpeciesProfile, sources: Record<string, string>): ProfileDraft {
  const density = profile.establishment.density;
  const values: Record<ScalarKey, number | undefined> = {
    'fecundity.maxSeedsPerPlant': profile.fecundity.maxSeedsPerPlant,
    'fecundity.densityCoefficient': profile.fecundity.densityCoefficient,
    'fecundity.aggregation': profile.fecundity.aggregation,
    'germination.deep': profile.germination.deep,
    'seedDecay.shallow': profile.seedDecay.shallow,
    'seedDecay.deep': profile.seedDecay.deep,
    ageClasses: profile.ageClasses,
    'establishment.survival': profile.establishment.survival,
    // The other crowding form keeps its catalogue default, ready if the person switches to it.
    'establishment.density.c':
      density.kind === 'beverton-holt'
        ? density.c
        : parameterCatalogue['profile.establishment.density.c'].default,
    'establishment.density.K':
      density.kind === 'ceiling' ? density.K : parameterCatalogue['profile.establishment.density.K'].default,
    floweringProbability: profile.floweringProbability,
    overWinterSurvival: profile.overWinterSurvival,
    rootCrownRegrowth: profile.rootCrownRegrowth,
    fragmentEstablishment: profile.fragmentEstablishment,
    seedRainLoss: profile.seedRainLoss,
    'environment.germinationCv': profile.environment.germinationCv,
    'environment.establishmentCv': profile.environment.establishmentCv,
    'environment.fecundityCv': profile.environment.fecundityCv,
  };
  const numbers = Object.fromEntries(scalarKeys.map((k) => [k, draftOf(values[k])])) as Record<
    ScalarKey,
    NumberDraft
  >;
  return {
    name: profile.name,
    lifeForm: profile.lifeForm,
    numbers,
    shallowByAge: profile.germination.shallowByAge.map(draftOf),
    densityKind: density.kind,
    sources: { ...sources },
  };
}

const d = (key: ScalarKey) => parameterCatalogue[catalogueKey(key)].default as number;

/** A new profile starts from the catalogue's defaults, each marked with where it came from. */
export function defaultProfile(): SpeciesProfile {
  return {
    name: '',
    lifeForm: 'perennial',
    fecundity: {
      maxSeedsPerPlant: d('fecundity.maxSeedsPerPlant'),
      densityCoefficient: d('fecundity.densityCoefficient'),
      aggregation: d('fecundity.aggregation'),
    },
    germination: {
      shallowByAge: [parameterCatalogue['profile.germination.shallowByAge[]'].default as number],
      deep: d('germination.deep'),
    },
    seedDecay: { shallow: d('seedDecay.shallow'), deep: d('seedDecay.deep') },
    ageClasses: d('ageClasses'),
    establishment: {
      survival: d('establishment.survival'),
      density: { kind: 'beverton-holt', c: d('establishment.density.c') },
    },
    floweringProbability: d('floweringProbability'),
    overWinterSurvival: d('overWinterSurvival'),
    rootCrownRegrowth: d('rootCrownRegrowth'),
    fragmentEstablishment: d('fragmentEstablishment'),
    seedRainLoss: d('seedRainLoss'),
    environment: {
      germinationCv: d('environment.germinationCv'),
      establishmentCv: d('environment.establishmentCv'),
      fecundityCv: d('environment.fecundityCv'),
    },
  };
}

/** The profile to save (or preview), or why it cannot be built yet. */
export function buildProfile(draft: ProfileDraft): Built<ProfileBody> {
  const errors: Record<string, string> = {};
  const value = {} as Record<ScalarKey, number | undefined>;
  const skipped: ScalarKey =
    draft.densityKind === 'beverton-holt' ? 'establishment.density.K' : 'establishment.density.c';
  for (const key of scalarKeys) {
    if (key === skipped) continue;
    const read = readNumber(catalogueKey(key), draft.numbers[key], key === 'fecundity.aggregation');
    if (read.error) errors[`profile.${key}`] = read.error;
    value[key] = read.value;
  }
  const byAge = draft.shallowByAge.map((entry, i) => {
    const read = readNumber('profile.germination.shallowByAge[]', entry);
    if (read.error) errors[`profile.${SHALLOW_BY_AGE}[${i}]`] = read.error;
    return read.value ?? 0;
  });
  const name = draft.name.trim();
  if (name.length === 0 || draft.name.length > 200)
    errors['profile.name'] = 'must be 1–200 characters (the profile name)';
  for (const [key, note] of Object.entries(draft.sources)) {
    if (note.trim().length > 500) errors[`sources.${key}`] = 'A source note must be at most 500 characters';
  }
  if (Object.keys(errors).length > 0) return { body: null, errors };

  const v = (key: ScalarKey) => value[key] as number;
  const candidate: SpeciesProfile = {
    name: draft.name,
    lifeForm: draft.lifeForm,
    fecundity: {
      maxSeedsPerPlant: v('fecundity.maxSeedsPerPlant'),
      densityCoefficient: v('fecundity.densityCoefficient'),
      ...(value['fecundity.aggregation'] === undefined ? {} : { aggregation: v('fecundity.aggregation') }),
    },
    germination: { shallowByAge: byAge, deep: v('germination.deep') },
    seedDecay: { shallow: v('seedDecay.shallow'), deep: v('seedDecay.deep') },
    ageClasses: v('ageClasses'),
    establishment: {
      survival: v('establishment.survival'),
      density:
        draft.densityKind === 'beverton-holt'
          ? { kind: 'beverton-holt', c: v('establishment.density.c') }
          : { kind: 'ceiling', K: v('establishment.density.K') },
    },
    floweringProbability: v('floweringProbability'),
    overWinterSurvival: v('overWinterSurvival'),
    rootCrownRegrowth: v('rootCrownRegrowth'),
    fragmentEstablishment: v('fragmentEstablishment'),
    seedRainLoss: v('seedRainLoss'),
    environment: {
      germinationCv: v('environment.germinationCv'),
      establishmentCv: v('environment.establishmentCv'),
      fecundityCv: v('environment.fecundityCv'),
    },
  };
  // The rules that tie fields together (one germination value per age class at most,
  // annuals do not overwinter) come from the shared schema, worded as the server words them.
  const parsed = profileSchema.safeParse(candidate);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const path = formatPath(['profile', ...issue.path]);
      errors[path] ??= issue.message;
    }
    return { body: null, errors };
  }
  const sources = Object.fromEntries(
    Object.entries(draft.sources)
      .map(([key, note]) => [key, note.trim()] as const)
      .filter(([, note]) => note !== ''),
  );
  return { body: { profile: parsed.data, sources }, errors };
}
