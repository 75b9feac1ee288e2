// The plain shape of a scenario: what the engine needs to project one field under one
// strategy. Units are part of the names' documentation (all metric; the UI converts).
// The zod schema in shared/scenario/ validates JSON into exactly these types.

export type LifeForm = 'annual' | 'biennial' | 'perennial';

/** A value for each soil layer: shallow (seeds can emerge) and deep (they mostly cannot). */
export interface LayerValues {
  shallow: number;
  deep: number;
}

/**
 * Density dependence of seedling establishment. Beverton–Holt: survival s_e / (1 + c·N)
 * with N emerging seedlings per m² (c in m²/plant). Ceiling: survival s_e, but at most
 * K plants/m² establish.
 */
export type EstablishmentDensity = { kind: 'beverton-holt'; c: number } | { kind: 'ceiling'; K: number };

export interface SpeciesProfile {
  name: string;
  lifeForm: LifeForm;
  fecundity: {
    /** f_max: seeds per flowering plant without crowding (seeds/plant). */
    maxSeedsPerPlant: number;
    /** Watkinson's a: seeds per plant = f_max / (1 + a·F), F flowering plants/m² (m²/plant). */
    densityCoefficient: number;
    /** Negative-binomial size per plant for seed counts; absent means Poisson counts. */
    aggregation?: number;
  };
  germination: {
    /** Fraction of shallow seeds emerging, by age class (0 = shed last year); the last value covers older classes. */
    shallowByAge: number[];
    /** Fraction of deep seeds emerging (0 for light-requiring seeds). */
    deep: number;
  };
  /** Fraction of viable seeds lost per year, by layer. */
  seedDecay: LayerValues;
  /** Number of seedbank age classes; the last one is absorbing. */
  ageClasses: number;
  establishment: {
    /** s_e: fraction of emerged seedlings that establish, before crowding. */
    survival: number;
    density: EstablishmentDensity;
  };
  /** p_f: fraction of candidate plants that flower in a year. */
  floweringProbability: number;
  /** Fraction of established plants surviving the winter (0 for an annual). */
  overWinterSurvival: number;
  /** r: fraction of top-killed plants that regrow from the root crown. */
  rootCrownRegrowth: number;
  /** Fraction of root fragments made by cultivation that establish as new plants. */
  fragmentEstablishment: number;
  /** Fraction of shed seed lost before it reaches the seedbank (predation, harvest removal). */
  seedRainLoss: number;
  /** Coefficients of variation of the per-year environmental multipliers. */
  environment: { germinationCv: number; establishmentCv: number; fecundityCv: number };
}

export interface FieldSetting {
  name: string;
  areaHa: number;
  /** Viable seeds per m² at the first census, by layer. */
  initialSeedbank: LayerValues;
  /** Established plants per m² at the first census. */
  initialPlants: number;
  /** Seeds per m² per year arriving from margins, equipment or manure. */
  immigrantSeedRain: number;
  /** Value of the crop per ha and year (currency units). */
  cropValuePerHa: number;
  /** Cousens (1985) yield loss: I % per plant/m² at low density, A % asymptote. */
  yieldLoss: { I: number; A: number };
  /** Fraction by which the standing crop cuts seeds per plant. */
  cropCompetition: number;
}

export type Timing = 'dormant-early-spring' | 'spring' | 'summer' | 'late-summer' | 'fall';
export type TargetStage = 'seedlings' | 'rosettes' | 'flowering';

/** Efficacy (a fraction) as trials report it: mean and SD (beta) or a min–mode–max range (triangular). */
export type Efficacy = { mean: number; sd: number } | { min: number; mode: number; max: number };

/** Years are counted 1..horizon. */
export type Schedule =
  | { kind: 'every-year' }
  | { kind: 'every-k-years'; k: number; start: number }
  | { kind: 'year-range'; first: number; last: number };

/** Cost per ha of one application. */
export interface StepCost {
  material: number;
  application: number;
}

/** As entered by the user; the product never fills in or suggests a rate. */
export interface ChemicalDetails {
  activeIngredient: string;
  /** Present together or not at all. */
  rate?: number;
  rateUnit?: string;
}

interface StepCommon {
  label: string;
  timing: Timing;
  schedule: Schedule;
  efficacy: Efficacy;
  cost: StepCost;
}

export type PreEmergenceHerbicideStep = StepCommon & {
  kind: 'pre-emergence-herbicide';
  chemical?: ChemicalDetails;
};
export type MulchStep = StepCommon & { kind: 'mulch' };
export type PostEmergenceHerbicideStep = StepCommon & {
  kind: 'post-emergence-herbicide';
  targets: TargetStage[];
  topKill: number;
  chemical?: ChemicalDetails;
};
export type SpotTreatmentStep = StepCommon & {
  kind: 'spot-treatment';
  targets: TargetStage[];
  topKill: number;
  chemical?: ChemicalDetails;
};
export type HandRemovalWithCrownStep = StepCommon & {
  kind: 'hand-removal-with-crown';
  targets: TargetStage[];
};
export type HandRemovalLeavingCrownStep = StepCommon & {
  kind: 'hand-removal-leaving-crown';
  targets: TargetStage[];
};
export type CultivationStep = StepCommon & {
  kind: 'cultivation';
  targets: TargetStage[];
  /** Fraction of shallow seeds moved to the deep layer. */
  burial: number;
  /** Fraction of deep seeds brought up to the shallow layer. */
  exhumation: number;
  /** Root fragments made per plant the cultivation kills. */
  fragmentsPerPlant: number;
};
export type MowingStep = StepCommon & {
  kind: 'mowing';
  seedsPerPlantReduction: number;
  seedReturnReduction: number;
};
export type SeedSetPreventionStep = StepCommon & {
  kind: 'seed-set-prevention';
  seedsPerPlantReduction: number;
  seedReturnReduction: number;
};
export type CropCompetitionStep = StepCommon & { kind: 'crop-competition' };

export type Step =
  | PreEmergenceHerbicideStep
  | MulchStep
  | PostEmergenceHerbicideStep
  | SpotTreatmentStep
  | HandRemovalWithCrownStep
  | HandRemovalLeavingCrownStep
  | CultivationStep
  | MowingStep
  | SeedSetPreventionStep
  | CropCompetitionStep;

export type StepKind = Step['kind'];

export interface Strategy {
  name: string;
  steps: Step[];
}

export type EfficacyDraw = 'per-replicate' | 'per-application';

export interface Scenario {
  profile: SpeciesProfile;
  field: FieldSetting;
  strategy: Strategy;
  horizonYears: number;
  replicates: number;
  seed: number;
  /** Uncertain efficacy drawn once per replicate (a trial's spread between fields) or at every application. */
  efficacyDraw: EfficacyDraw;
  /** Seedbank (seeds/m²) below which the field counts as functionally depleted. */
  depletionThreshold: number;
  /** Yearly discount rate for net present value (fraction). */
  discountRate: number;
  /** "Let it seed": in this year (1..horizon) the seed-set steps do not happen. */
  letItSeedYear?: number;
}
