import { fieldBody, type FieldBody } from '../../../../shared/api/fields';
import { parameterCatalogue, type ParameterKey } from '../../../../shared/scenario/parameters';
import { formatPath } from '../../../../shared/scenario/parse';
import type { FieldSetting } from '../../../../models/scenario/types';
import type { Built } from '../../shared/lib/draftForm';
import { draftOf, parseTyped, readNumber, type NumberDraft } from '../../shared/lib/parameterDraft';

/*
 * A field as it is being edited, every number kept as typed. Errors are keyed by the
 * server's paths for the field body ("setting.initialSeedbank.shallow", "crop").
 */

export const fieldNumberKeys = [
  'areaHa',
  'initialSeedbank.shallow',
  'initialSeedbank.deep',
  'initialPlants',
  'immigrantSeedRain',
  'cropValuePerHa',
  'yieldLoss.I',
  'yieldLoss.A',
  'cropCompetition',
] as const;
export type FieldNumberKey = (typeof fieldNumberKeys)[number];

export const catalogueKey = (key: FieldNumberKey) => `field.${key}` as ParameterKey;

export type FieldDraft = {
  name: string;
  crop: string;
  plantingYear: string;
  notes: string;
  numbers: Record<FieldNumberKey, NumberDraft>;
};

function valuesOf(setting: FieldSetting): Record<FieldNumberKey, number> {
  return {
    areaHa: setting.areaHa,
    'initialSeedbank.shallow': setting.initialSeedbank.shallow,
    'initialSeedbank.deep': setting.initialSeedbank.deep,
    initialPlants: setting.initialPlants,
    immigrantSeedRain: setting.immigrantSeedRain,
    cropValuePerHa: setting.cropValuePerHa,
    'yieldLoss.I': setting.yieldLoss.I,
    'yieldLoss.A': setting.yieldLoss.A,
    cropCompetition: setting.cropCompetition,
  };
}

export function draftFromField(field: {
  crop: string;
  plantingYear: number | null;
  notes: string;
  setting: FieldSetting;
}): FieldDraft {
  const values = valuesOf(field.setting);
  return {
    name: field.setting.name,
    crop: field.crop,
    plantingYear: field.plantingYear === null ? '' : String(field.plantingYear),
    notes: field.notes,
    numbers: Object.fromEntries(fieldNumberKeys.map((k) => [k, draftOf(values[k])])) as Record<
      FieldNumberKey,
      NumberDraft
    >,
  };
}

const catalogueDefault = (key: FieldNumberKey) => parameterCatalogue[catalogueKey(key)].default as number;

/** A new field starts from the catalogue defaults (all illustrative) and an empty name and crop. */
export function newFieldDraft(): FieldDraft {
  return draftFromField({
    crop: '',
    plantingYear: null,
    notes: '',
    setting: {
      name: '',
      areaHa: catalogueDefault('areaHa'),
      initialSeedbank: {
        shallow: catalogueDefault('initialSeedbank.shallow'),
        deep: catalogueDefault('initialSeedbank.deep'),
      },
      initialPlants: catalogueDefault('initialPlants'),
      immigrantSeedRain: catalogueDefault('immigrantSeedRain'),
      cropValuePerHa: catalogueDefault('cropValuePerHa'),
      yieldLoss: { I: catalogueDefault('yieldLoss.I'), A: catalogueDefault('yieldLoss.A') },
      cropCompetition: catalogueDefault('cropCompetition'),
    },
  });
}

export function buildField(draft: FieldDraft): Built<FieldBody> {
  const errors: Record<string, string> = {};
  const value = {} as Record<FieldNumberKey, number>;
  for (const key of fieldNumberKeys) {
    const read = readNumber(catalogueKey(key), draft.numbers[key]);
    if (read.error) errors[`setting.${key}`] = read.error;
    // A refused number is stood in by its default so the rest of the form is still checked.
    value[key] = read.value ?? catalogueDefault(key);
  }
  const year = parseTyped(draft.plantingYear);
  if (year !== null && Number.isNaN(year)) errors.plantingYear = 'Planting year must be a year such as 2019';
  const candidate = {
    crop: draft.crop,
    plantingYear: year === null || Number.isNaN(year) ? null : year,
    notes: draft.notes,
    setting: {
      name: draft.name,
      areaHa: value.areaHa,
      initialSeedbank: { shallow: value['initialSeedbank.shallow'], deep: value['initialSeedbank.deep'] },
      initialPlants: value.initialPlants,
      immigrantSeedRain: value.immigrantSeedRain,
      cropValuePerHa: value.cropValuePerHa,
      yieldLoss: { I: value['yieldLoss.I'], A: value['yieldLoss.A'] },
      cropCompetition: value.cropCompetition,
    },
  };
  // Name, crop, year and notes are checked by the same schema the server uses.
  const parsed = fieldBody.safeParse(candidate);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) errors[formatPath(issue.path)] ??= issue.message;
  }
  if (Object.keys(errors).length > 0 || !parsed.success) return { body: null, errors };
  return { body: parsed.data, errors };
}
