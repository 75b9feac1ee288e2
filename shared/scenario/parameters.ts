// The catalogue of every numeric scenario field: what the UI shows beside the field
// (label, meaning, unit, valid range, default and where the default came from) and the
// range the schema enforces. One table, so the form and the validator cannot drift apart.
// Keys are field paths; "[]" stands for any array index.

export interface NumericParameter {
  readonly label: string;
  readonly meaning: string;
  /** Metric unit as shown to the user. */
  readonly unit: string;
  readonly min: number;
  readonly max: number;
  /** True when min itself is not allowed (the value must be above it). */
  readonly minExclusive?: boolean;
  readonly integer?: boolean;
  /** Suggested starting value; null where the product must never suggest one. */
  readonly default: number | null;
  readonly defaultSource: string;
  /** Background the UI can show under the field. */
  readonly note?: string;
}

const ILLUSTRATIVE = 'illustrative';
const fraction = (
  label: string,
  meaning: string,
  def: number,
  source = ILLUSTRATIVE,
  note?: string,
): NumericParameter => ({
  label,
  meaning,
  unit: 'fraction',
  min: 0,
  max: 1,
  default: def,
  defaultSource: source,
  ...(note === undefined ? {} : { note }),
});
const perYear = (p: NumericParameter): NumericParameter => ({ ...p, unit: 'fraction per year' });
const cost = (label: string, meaning: string): NumericParameter => ({
  label,
  meaning,
  unit: 'currency/ha',
  min: 0,
  max: 10_000_000,
  default: 0,
  defaultSource: ILLUSTRATIVE,
});
const scheduleYear = (label: string, meaning: string): NumericParameter => ({
  label,
  meaning,
  unit: 'year',
  min: 1,
  max: 200,
  integer: true,
  default: 1,
  defaultSource: ILLUSTRATIVE,
});
const cv = (label: string, meaning: string, def: number): NumericParameter => ({
  label,
  meaning,
  unit: 'coefficient of variation',
  min: 0,
  max: 3,
  default: def,
  defaultSource: ILLUSTRATIVE,
});

export const parameterCatalogue = {
  'profile.fecundity.maxSeedsPerPlant': {
    label: 'Seeds per flowering plant (f_max)',
    meaning: 'Seeds one flowering plant sets without crowding.',
    unit: 'seeds/plant',
    min: 0,
    max: 10_000_000,
    default: 60_000,
    defaultSource:
      'common practice, no published source: a flowering plant of a perennial broadleaf dock can shed about 60,000 seeds a year (27,000–60,000 reported across regions)',
  },
  'profile.fecundity.densityCoefficient': {
    label: 'Seed-set crowding coefficient (a)',
    meaning:
      'Watkinson (1980) crowding: seeds per plant = f_max / (1 + a·F) with F flowering plants per m²; 0 means no crowding.',
    unit: 'm²/plant',
    min: 0,
    max: 100,
    default: 0.05,
    defaultSource: ILLUSTRATIVE,
  },
  'profile.fecundity.aggregation': {
    label: 'Seed-count aggregation (k)',
    meaning:
      'Negative-binomial size per plant: smaller k means more uneven seed counts (variance mean + mean²/k); leave empty for Poisson counts.',
    unit: 'per plant',
    min: 0,
    minExclusive: true,
    max: 1_000_000,
    default: 2,
    defaultSource: ILLUSTRATIVE,
  },
  'profile.germination.shallowByAge[]': perYear(
    fraction(
      'Germination, shallow layer, by seed age',
      'Fraction of shallow seeds of this age class that emerge in a year (class 0 = shed last year; 0 there means first-year dormancy). The last value covers all older classes.',
      0.06,
      ILLUSTRATIVE,
      'Germination tests of dock seed were best near 20 °C (68 °F) among 15, 20 and 25 °C (59, 68, 77 °F) — common practice, no published source.',
    ),
  ),
  'profile.germination.deep': perYear(
    fraction(
      'Germination, deep layer',
      'Fraction of deep seeds that emerge in a year.',
      0,
      'common practice, no published source: the seeds need light to germinate, so buried seed hardly emerges',
    ),
  ),
  'profile.seedDecay.shallow': perYear(
    fraction('Seed decay, shallow layer', 'Fraction of viable shallow seeds lost per year.', 0.12),
  ),
  'profile.seedDecay.deep': perYear(
    fraction(
      'Seed decay, deep layer',
      'Fraction of viable deep seeds lost per year (burial often slows decay).',
      0.04,
      'chosen so that about a fifth of buried seed is still viable after 40 years; common practice, no published source: dock seed stays viable in soil for more than 40 years',
    ),
  ),
  'profile.ageClasses': {
    label: 'Seedbank age classes',
    meaning: 'Number of seed age classes tracked per layer; the last class holds all older seed.',
    unit: 'classes',
    min: 1,
    max: 50,
    integer: true,
    default: 4,
    defaultSource: ILLUSTRATIVE,
  },
  'profile.establishment.survival': fraction(
    'Seedling establishment (s_e)',
    'Fraction of emerged seedlings that become established plants, before crowding.',
    0.25,
  ),
  'profile.establishment.density.c': {
    label: 'Establishment crowding coefficient (c)',
    meaning:
      'Beverton–Holt crowding: establishment = s_e / (1 + c·N) with N emerging seedlings per m²; 0 means no crowding.',
    unit: 'm²/plant',
    min: 0,
    max: 100,
    default: 0.02,
    defaultSource: ILLUSTRATIVE,
  },
  'profile.establishment.density.K': {
    label: 'Establishment ceiling (K)',
    meaning: 'At most this many seedlings per m² establish in a year; below it there is no crowding.',
    unit: 'plants/m²',
    min: 0,
    minExclusive: true,
    max: 100_000,
    default: 40,
    defaultSource: ILLUSTRATIVE,
  },
  'profile.floweringProbability': perYear(
    fraction(
      'Flowering probability (p_f)',
      'Fraction of plants old enough to flower that flower in a year.',
      0.5,
    ),
  ),
  'profile.overWinterSurvival': perYear(
    fraction(
      'Over-winter survival',
      'Fraction of established plants alive at the next census (must be 0 for an annual).',
      0.8,
    ),
  ),
  'profile.rootCrownRegrowth': fraction(
    'Root-crown regrowth (r)',
    'Fraction of top-killed plants (shoots removed, root crown left) that regrow.',
    0.9,
    'common practice, no published source: the regenerative part of the root crown is the top ~10 cm (4 in), so removal that leaves it lets the plant regrow',
  ),
  'profile.fragmentEstablishment': fraction(
    'Root-fragment establishment',
    'Fraction of root fragments cut by cultivation that establish as new plants.',
    0.05,
  ),
  'profile.seedRainLoss': fraction(
    'Seed-rain loss',
    'Fraction of shed seed that never reaches the seedbank (predation, removal with the harvest).',
    0.3,
  ),
  'profile.environment.germinationCv': cv(
    'Year-to-year variation in germination',
    'Coefficient of variation of the yearly germination multiplier (log-normal, mean 1).',
    0.2,
  ),
  'profile.environment.establishmentCv': cv(
    'Year-to-year variation in establishment',
    'Coefficient of variation of the yearly establishment multiplier (log-normal, mean 1).',
    0.2,
  ),
  'profile.environment.fecundityCv': cv(
    'Year-to-year variation in seed set',
    'Coefficient of variation of the yearly seed-set multiplier (log-normal, mean 1).',
    0.3,
  ),

  'field.areaHa': {
    label: 'Field area',
    meaning: 'Area the projection counts individual seeds and plants over (sets the size of chance effects).',
    unit: 'ha',
    min: 0,
    minExclusive: true,
    max: 10_000,
    default: 1,
    defaultSource: ILLUSTRATIVE,
  },
  'field.initialSeedbank.shallow': {
    label: 'Initial seedbank, shallow layer',
    meaning: 'Viable seeds per m² in the layer seeds can emerge from, at the first census.',
    unit: 'seeds/m²',
    min: 0,
    max: 1_000_000,
    default: 2000,
    defaultSource: ILLUSTRATIVE,
  },
  'field.initialSeedbank.deep': {
    label: 'Initial seedbank, deep layer',
    meaning: 'Viable seeds per m² below emergence depth, at the first census.',
    unit: 'seeds/m²',
    min: 0,
    max: 1_000_000,
    default: 3000,
    defaultSource: ILLUSTRATIVE,
  },
  'field.initialPlants': {
    label: 'Initial established plants',
    meaning: 'Established plants per m² at the first census.',
    unit: 'plants/m²',
    min: 0,
    max: 10_000,
    default: 1,
    defaultSource: ILLUSTRATIVE,
  },
  'field.immigrantSeedRain': {
    label: 'Immigrant seed rain',
    meaning: 'Seeds per m² arriving each year from margins, equipment or manure.',
    unit: 'seeds/m²/year',
    min: 0,
    max: 1_000_000,
    default: 0,
    defaultSource: ILLUSTRATIVE,
  },
  'field.cropValuePerHa': {
    label: 'Crop value',
    meaning: 'Value of a weed-free crop per ha and year.',
    unit: 'currency/ha/year',
    min: 0,
    max: 1_000_000_000,
    default: 20_000,
    defaultSource: ILLUSTRATIVE,
  },
  'field.yieldLoss.I': {
    label: 'Yield loss per plant at low density (I)',
    meaning: 'Cousens (1985) hyperbola: % crop loss per weed plant/m² when weeds are sparse.',
    unit: '% per plant/m²',
    min: 0,
    max: 100,
    default: 1,
    defaultSource: ILLUSTRATIVE,
  },
  'field.yieldLoss.A': {
    label: 'Maximum yield loss (A)',
    meaning: 'Cousens (1985) hyperbola: % crop loss approached at very high weed density.',
    unit: '%',
    min: 0,
    minExclusive: true,
    max: 100,
    default: 50,
    defaultSource: ILLUSTRATIVE,
  },
  'field.cropCompetition': fraction(
    'Crop competition',
    'Fraction by which the standing crop cuts seeds per weed plant.',
    0,
  ),

  'strategy.steps[].efficacy.mean': fraction(
    'Efficacy, mean',
    'Mean efficacy of the step (its meaning depends on the kind, see the step kinds).',
    0.9,
  ),
  'strategy.steps[].efficacy.sd': {
    label: 'Efficacy, standard deviation',
    meaning:
      'Spread of the efficacy between fields or applications (beta distribution); 0 for a fixed value.',
    unit: 'fraction',
    min: 0,
    max: 0.5,
    default: 0.05,
    defaultSource: ILLUSTRATIVE,
  },
  'strategy.steps[].efficacy.min': fraction(
    'Efficacy, lowest',
    'Lowest efficacy seen in trials (triangular distribution).',
    0.7,
  ),
  'strategy.steps[].efficacy.mode': fraction(
    'Efficacy, most likely',
    'Most likely efficacy (triangular distribution).',
    0.9,
  ),
  'strategy.steps[].efficacy.max': fraction(
    'Efficacy, highest',
    'Highest efficacy seen in trials (triangular distribution).',
    0.98,
  ),
  'strategy.steps[].topKill': fraction(
    'Top-kill fraction',
    'Of the targeted plants the step does not kill, the fraction whose shoots die back to the root crown.',
    0,
  ),
  'strategy.steps[].burial': fraction(
    'Burial',
    'Fraction of shallow seeds the cultivation moves to the deep layer.',
    0.3,
  ),
  'strategy.steps[].exhumation': fraction(
    'Exhumation',
    'Fraction of deep seeds the cultivation brings up to the shallow layer.',
    0.2,
  ),
  'strategy.steps[].fragmentsPerPlant': {
    label: 'Root fragments per plant',
    meaning: 'Root pieces the cultivation cuts from each plant it kills.',
    unit: 'fragments/plant',
    min: 0,
    max: 1000,
    default: 4,
    defaultSource: ILLUSTRATIVE,
  },
  'strategy.steps[].seedsPerPlantReduction': fraction(
    'Cut in seeds per plant',
    'Fraction of seeds per flowering plant the step removes when it fully succeeds (scaled by efficacy).',
    0.9,
  ),
  'strategy.steps[].seedReturnReduction': fraction(
    'Cut in seed return',
    'Fraction of produced seed kept from reaching the soil when the step fully succeeds (scaled by efficacy).',
    0,
  ),
  'strategy.steps[].cost.material': cost('Material cost', 'Cost of materials per ha for one application.'),
  'strategy.steps[].cost.application': cost(
    'Application cost',
    'Cost of labour and machinery per ha for one application.',
  ),
  'strategy.steps[].chemical.rate': {
    label: 'Rate (as on the label)',
    meaning:
      'Rate of the active ingredient as the user entered it from the product label; the label is the legal guide.',
    unit: 'in the rate unit entered',
    min: 0,
    minExclusive: true,
    max: Number.MAX_VALUE,
    default: null,
    defaultSource: 'none: rates are entered from the label and never suggested',
  },
  'strategy.steps[].schedule.k': {
    ...scheduleYear('Every k years', 'Interval between applications.'),
    unit: 'years',
  },
  'strategy.steps[].schedule.start': scheduleYear(
    'First year',
    'Year of the first application (years count from 1).',
  ),
  'strategy.steps[].schedule.first': scheduleYear(
    'From year',
    'First year of the range (years count from 1).',
  ),
  'strategy.steps[].schedule.last': scheduleYear('To year', 'Last year of the range (inclusive).'),

  horizonYears: {
    label: 'Horizon',
    meaning: 'Number of years projected.',
    unit: 'years',
    min: 1,
    max: 200,
    integer: true,
    default: 10,
    defaultSource: 'common practice, no published source: consultants plan ten-year strategies',
  },
  replicates: {
    label: 'Replicates',
    meaning: 'Number of stochastic runs summarised.',
    unit: 'runs',
    min: 1,
    max: 100_000,
    integer: true,
    default: 1000,
    defaultSource: ILLUSTRATIVE,
  },
  letItSeedYear: {
    label: 'Let-it-seed year',
    meaning:
      "A year in which the strategy's seed-set steps (mowing, seed-head removal) do not happen, to price one year of letting the weed seed.",
    unit: 'year',
    min: 1,
    max: 200,
    integer: true,
    default: 3,
    defaultSource: ILLUSTRATIVE,
  },
  seed: {
    label: 'Random seed',
    meaning: 'Seed of the random streams: the same inputs and seed always give the same numbers.',
    unit: 'integer',
    min: 0,
    max: 4_294_967_295,
    integer: true,
    default: 1,
    defaultSource: ILLUSTRATIVE,
  },
  depletionThreshold: {
    label: 'Depletion threshold',
    meaning: 'Seedbank below which the field counts as functionally depleted.',
    unit: 'seeds/m²',
    min: 0,
    max: 1_000_000,
    default: 1,
    defaultSource:
      'common practice, no published source: below about 1 seed/m² a seedbank is treated as functionally depleted',
  },
  discountRate: {
    label: 'Discount rate',
    meaning: 'Yearly rate used to discount future costs and losses in the net present value.',
    unit: 'fraction per year',
    min: 0,
    max: 1,
    default: 0.05,
    defaultSource: ILLUSTRATIVE,
  },
} as const satisfies Record<string, NumericParameter>;

export type ParameterKey = keyof typeof parameterCatalogue;

const formatNumber = (x: number): string =>
  x === Number.MAX_VALUE ? '∞' : x.toLocaleString('en-US', { maximumFractionDigits: 6 });

/** The valid range with its unit, as shown in messages: "0–1 (fraction)", "0–10,000 (ha, above 0)". */
export function rangeText(p: NumericParameter): string {
  const lowest = formatNumber(p.min);
  if (p.max === Number.MAX_VALUE) return `${p.minExclusive ? 'above' : 'at least'} ${lowest} (${p.unit})`;
  return `${lowest}–${formatNumber(p.max)} (${p.unit}${p.minExclusive ? `, above ${lowest}` : ''})`;
}

export function isInRange(p: NumericParameter, value: number): boolean {
  const aboveMin = p.minExclusive ? value > p.min : value >= p.min;
  return aboveMin && value <= p.max;
}
