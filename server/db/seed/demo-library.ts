// The invented demo's library: two built-in illustrative profiles (every workspace sees
// them), the farm's two fields, three strategies and a ten-year scenario. Chemical steps
// carry an active ingredient by its common name and NO rate: rates come from the label
// the user holds, never from Seedwake.
import type { FieldSetting, SpeciesProfile, Step } from '../../../models/scenario/types';
import demoDock from '../../../models/examples/demo-perennial-dock.json' with { type: 'json' };
import annualGoosefoot from '../../../models/examples/annual-goosefoot.json' with { type: 'json' };

const id = (n: number) => `5eedfa00-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;

export const builtInProfiles: { id: string; profile: SpeciesProfile; sources: Record<string, string> }[] = [
  {
    id: id(0x101),
    profile: demoDock.profile as SpeciesProfile,
    sources: {
      'fecundity.maxSeedsPerPlant':
        'common practice, no published source: a flowering dock plant can shed about 60,000 seeds a year (27,000–60,000 reported across regions)',
      'seedDecay.deep':
        'illustrative: buried dock seed can stay viable for more than 40 years (common practice, no published source)',
      'germination.deep':
        'seeds need light to germinate, so buried seed hardly emerges (common practice, no published source)',
      rootCrownRegrowth:
        'the top ~10 cm (4 in) of the root crown regenerates the plant (common practice, no published source)',
    },
  },
  { id: id(0x102), profile: annualGoosefoot.profile as SpeciesProfile, sources: {} },
];

const hollowLane: FieldSetting = { ...(demoDock.field as FieldSetting), name: 'Hollow Lane block' };
const northTerrace: FieldSetting = {
  name: 'North Terrace',
  areaHa: 1.2,
  initialSeedbank: { shallow: 600, deep: 1400 },
  initialPlants: 0.3,
  immigrantSeedRain: 5,
  cropValuePerHa: 18000,
  yieldLoss: { I: 1.5, A: 35 },
  cropCompetition: 0.25,
};

export const demoFields = [
  {
    id: id(0x201),
    crop: 'raspberry',
    plantingYear: 2021,
    notes: 'Invented demo field. Dock patches along the irrigation line.',
    setting: hollowLane,
  },
  {
    id: id(0x202),
    crop: 'blueberry',
    plantingYear: 2018,
    notes: 'Invented demo field. Goosefoot in the alleys after cultivation.',
    setting: northTerrace,
  },
];

const every = { kind: 'every-year' } as const;

const chemicalPlan: Step[] = [
  {
    label: 'Dormant-season residual herbicide',
    kind: 'pre-emergence-herbicide',
    timing: 'dormant-early-spring',
    schedule: every,
    efficacy: { mean: 0.8, sd: 0.1 },
    cost: { material: 90, application: 40 },
    chemical: { activeIngredient: 'napropamide' },
  },
  {
    label: 'Spring post-emergence on seedlings and rosettes',
    kind: 'post-emergence-herbicide',
    timing: 'spring',
    schedule: every,
    targets: ['seedlings', 'rosettes'],
    topKill: 0.3,
    efficacy: { mean: 0.75, sd: 0.12 },
    cost: { material: 70, application: 40 },
    chemical: { activeIngredient: 'clopyralid' },
  },
  {
    label: 'Fall spot treatment of survivors',
    kind: 'spot-treatment',
    timing: 'fall',
    schedule: every,
    targets: ['seedlings', 'rosettes', 'flowering'],
    topKill: 0.1,
    efficacy: { mean: 0.85, sd: 0.08 },
    cost: { material: 60, application: 120 },
    chemical: { activeIngredient: 'glyphosate' },
  },
];

const mowingPlan: Step[] = [
  {
    label: 'Cut shoots before flowering',
    kind: 'mowing',
    timing: 'summer',
    schedule: every,
    seedsPerPlantReduction: 0.7,
    seedReturnReduction: 0,
    efficacy: { mean: 0.85, sd: 0.08 },
    cost: { material: 0, application: 150 },
  },
  {
    label: 'Cut regrowth before seed set',
    kind: 'mowing',
    timing: 'late-summer',
    schedule: every,
    seedsPerPlantReduction: 0.6,
    seedReturnReduction: 0,
    efficacy: { mean: 0.8, sd: 0.1 },
    cost: { material: 0, application: 150 },
  },
];

export const demoStrategies = [
  {
    id: id(0x301),
    fieldId: id(0x201),
    name: 'Residual, post-emergence and spot treatment',
    description:
      'Dormant-season residual herbicide, a spring post-emergence application and a fall spot treatment, every year.',
    steps: chemicalPlan,
  },
  {
    id: id(0x302),
    fieldId: id(0x201),
    name: 'Repeated shoot removal before seed set',
    description: 'Two mowings a summer so that plants set little seed; the root crowns survive and regrow.',
    steps: mowingPlan,
  },
  {
    id: id(0x303),
    fieldId: id(0x201),
    name: 'Dig out crowns, then stop seed set',
    description:
      'Dig rosettes out with the root crown for three springs and cut seed heads every late summer.',
    steps: demoDock.strategy.steps as Step[],
  },
];

export const demoScenario = {
  id: id(0x401),
  name: 'Hollow Lane ten-year plan',
  fieldId: id(0x201),
  profileId: id(0x101),
  strategyIds: demoStrategies.map((s) => s.id),
  horizonYears: 10,
  replicates: 500,
  seed: 20261201,
  efficacyDraw: 'per-replicate' as const,
  depletionThreshold: 1,
  discountRate: 0.05,
};
