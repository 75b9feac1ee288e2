// A lesson's definition and the slider values on the page become ordinary engine
// scenarios. The browser runs their mean field for the instant picture; the server runs
// the very same scenarios with chance for "replay", so the two always describe one model.
import type { FieldSetting, Scenario, SpeciesProfile, Step } from '../../models/scenario/types';
import type { LessonDefinition } from '../api/lessons';

export type LessonRun = { id: string; label: string; scenario: Scenario };
export type SliderValues = Record<string, number>;

/** The slider values a lesson starts at. */
export function startingValues(definition: LessonDefinition): SliderValues {
  const values: SliderValues = {};
  for (const [key, s] of Object.entries(definition.settings.sliders as Record<string, { value: number }>))
    values[key] = s.value;
  return values;
}

const every = { kind: 'every-year' } as const;
const free = { material: 0, application: 0 };
// Efficacies are fixed (sd 0): a replay's chance is the demography and the weather, not a
// spread of the control that the sliders already set.
const fixed = (mean: number) => ({ mean, sd: 0 });

function lessonField(areaHa: number, shallow: number, plants: number): FieldSetting {
  return {
    name: 'Lesson field (illustrative)',
    areaHa,
    initialSeedbank: { shallow, deep: 0 },
    initialPlants: plants,
    immigrantSeedRain: 0,
    cropValuePerHa: 0,
    yieldLoss: { I: 0, A: 50 },
    cropCompetition: 0,
  };
}

/**
 * A cohort of seed with no plants: emerging seedlings never establish, so the seedbank
 * only falls, S_t = S_0·((1 − g)(1 − d))^t (germinated seed leaves the bank, survivors decay).
 */
function cohortProfile(name: string, decay: number, germination: number): SpeciesProfile {
  return {
    name,
    lifeForm: 'annual',
    fecundity: { maxSeedsPerPlant: 0, densityCoefficient: 0 },
    germination: { shallowByAge: [germination], deep: 0 },
    seedDecay: { shallow: decay, deep: decay },
    ageClasses: 1,
    establishment: { survival: 0, density: { kind: 'beverton-holt', c: 0 } },
    floweringProbability: 0,
    overWinterSurvival: 0,
    rootCrownRegrowth: 0,
    fragmentEstablishment: 0,
    seedRainLoss: 0,
    environment: { germinationCv: 0, establishmentCv: 0, fecundityCv: 0 },
  };
}

const digOut = (label: string, timing: 'spring' | 'summer', efficacy: number, flowering = false): Step => ({
  label,
  kind: 'hand-removal-with-crown',
  timing,
  schedule: every,
  targets: flowering ? ['flowering'] : ['seedlings', 'rosettes'],
  efficacy: fixed(efficacy),
  cost: free,
});

const cutSeedHeads = (efficacy: number): Step => ({
  label: 'Cut seed heads before they ripen',
  kind: 'seed-set-prevention',
  timing: 'late-summer',
  schedule: every,
  seedsPerPlantReduction: 0,
  seedReturnReduction: 1,
  efficacy: fixed(efficacy),
  cost: free,
});

type Chance = { replicates: number; seed: number };

/**
 * The scenarios a lesson draws, in the order its chart lists them. `profile` is the
 * lesson's species profile (required by every template but seedbank decay).
 */
export function lessonRuns(
  definition: LessonDefinition,
  profile: SpeciesProfile | null,
  values: SliderValues,
  chance: Chance = definition.settings,
): LessonRun[] {
  const { horizonYears } = definition.settings;
  const base = {
    horizonYears,
    replicates: chance.replicates,
    seed: chance.seed,
    efficacyDraw: 'per-replicate' as const,
    depletionThreshold: 1,
    discountRate: 0,
  };
  const withProfile = (): SpeciesProfile => {
    if (!profile) throw new Error(`the ${definition.template} lesson needs a species profile`);
    return profile;
  };

  switch (definition.template) {
    case 'seedbank-decay': {
      // One square metre: few enough seeds that a replay shows which seeds happen to survive.
      const field = lessonField(0.0001, definition.settings.initialSeedbank, 0);
      const cohort = (id: string, label: string, d: number, g: number): LessonRun => ({
        id,
        label,
        scenario: {
          ...base,
          profile: cohortProfile(label, d, g),
          field,
          strategy: { name: 'No new seed', steps: [] },
        },
      });
      return [
        cohort('cohort-a', 'Cohort A', values.decay, values.germination),
        cohort('cohort-b', 'Cohort B', values.compareDecay, values.compareGermination),
      ];
    }
    case 'one-year-seed-set': {
      const field = lessonField(1, values.initialSeedbank, definition.settings.initialPlants);
      const strategy = {
        name: 'Hold the field near depletion',
        steps: [
          digOut('Dig out seedlings and rosettes with the root crown', 'spring', values.plantControl),
          cutSeedHeads(values.seedSetControl),
        ],
      };
      const scenario = { ...base, profile: withProfile(), field, strategy };
      return [
        { id: 'every-year', label: 'Seed heads removed every year', scenario },
        {
          id: 'one-year-seeds',
          label: `Plants seed in year ${values.seedYear}`,
          scenario: { ...scenario, letItSeedYear: values.seedYear },
        },
      ];
    }
    case 'annual-vs-perennial': {
      const p = withProfile();
      const s = definition.settings;
      const field = lessonField(1, s.initialSeedbank, s.initialPlants);
      const strategy = {
        name: 'Shoot removal every summer',
        steps: [
          {
            label: 'Pull or cut the shoots, leaving the root crown',
            kind: 'hand-removal-leaving-crown',
            timing: 'summer',
            schedule: every,
            targets: ['rosettes', 'flowering'],
            efficacy: fixed(values.controlEfficacy),
            cost: free,
          } satisfies Step,
        ],
      };
      const r = values.rootCrownRegrowth;
      return [
        {
          id: 'regrows',
          label: `Regrows from the root crown (r = ${r})`,
          scenario: { ...base, profile: { ...p, rootCrownRegrowth: r }, field, strategy },
        },
        {
          id: 'no-regrowth',
          label: 'No root-crown regrowth (r = 0)',
          scenario: { ...base, profile: { ...p, rootCrownRegrowth: 0 }, field, strategy },
        },
      ];
    }
    case 'which-stage': {
      const p = withProfile();
      const s = definition.settings;
      const field = lessonField(1, s.initialSeedbank, s.initialPlants);
      const e = values.controlEfficacy;
      const run = (id: string, label: string, steps: Step[]): LessonRun => ({
        id,
        label,
        scenario: { ...base, profile: p, field, strategy: { name: label, steps } },
      });
      return [
        run('none', 'No control', []),
        run('emergence', 'Emerging seedlings (mulch)', [
          {
            label: 'Mulch smothers emerging seedlings',
            kind: 'mulch',
            timing: 'dormant-early-spring',
            schedule: every,
            efficacy: fixed(e),
            cost: free,
          },
        ]),
        run('established', 'Established plants (dug out in spring)', [
          digOut('Dig out seedlings and rosettes', 'spring', e),
        ]),
        run('flowering', 'Flowering plants (dug out in summer)', [
          digOut('Dig out flowering plants', 'summer', e, true),
        ]),
        run('seed', 'Seed (seed heads cut)', [cutSeedHeads(e)]),
      ];
    }
  }
}
