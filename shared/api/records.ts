// Field records: uploads of soil cores, plant counts, germination tests and efficacy
// trials, the estimates made from them, and their adoption into profiles, steps and fields.
import { z } from 'zod';
import { recordKinds } from '../records/columns';
import { idParam } from './workspaces';

export const recordKind = z.enum(recordKinds, {
  error: `Choose the kind of records: ${recordKinds.join(', ')}`,
});

export const recordsParams = z.strictObject({ workspaceId: idParam, fieldId: idParam });
export const uploadParams = z.strictObject({ workspaceId: idParam, fieldId: idParam, uploadId: idParam });
export const templateParams = z.strictObject({ kind: recordKind });
export const strategySourcesParams = z.strictObject({ workspaceId: idParam, strategyId: idParam });

/** The text fields sent beside the file in the multipart form. */
export const uploadFields = z.strictObject({
  kind: recordKind,
  /** Efficacy trials: the untreated check, exactly as in the treatment column. */
  check: z.string().trim().max(200, 'The check name must be at most 200 characters').optional(),
});
export type UploadFields = z.infer<typeof uploadFields>;

/** One problem in a file: `line` is the file line (null for the file as a whole), `column` the header as written. */
export const recordProblem = z.object({
  line: z.number().nullable(),
  column: z.string().nullable(),
  message: z.string(),
});
export type RecordProblem = z.infer<typeof recordProblem>;

export const columnUse = z.object({
  key: z.string(),
  label: z.string(),
  /** The header as written in the file. */
  header: z.string(),
  /** Unit the value is stored in (null for labels). */
  unit: z.string().nullable(),
  /** Unit the file gave it in: from the header, or "per row" from a unit column. */
  fileUnit: z.string().nullable(),
  /** How it was converted, with the source of the factor; null when no conversion was needed. */
  conversion: z.string().nullable(),
});
export type ColumnUse = z.infer<typeof columnUse>;

export const previewRow = z.object({
  line: z.number(),
  /** Values in the stored units, by column key; null where the cell could not be read. */
  values: z.record(z.string(), z.union([z.string(), z.number(), z.null()])),
  /** The cells as written, by column key. */
  raw: z.record(z.string(), z.string()),
});
export type PreviewRow = z.infer<typeof previewRow>;

const estimateSchema = z.object({
  estimate: z.number(),
  lower: z.number(),
  upper: z.number(),
  confidence: z.number(),
});

const proportionSchema = z.object({
  successes: z.number(),
  trials: z.number(),
  estimate: z.number(),
  lower: z.number(),
  upper: z.number(),
  confidence: z.number(),
  method: z.enum(['wilson', 'clopper-pearson']),
});

export const sourceRef = z.object({ uploadId: z.string(), filename: z.string(), sha256: z.string() });
export type SourceRef = z.infer<typeof sourceRef>;

/** Profile parameters an estimate can be adopted into (the profile's `sources` keys, with the array index). */
export const adoptableParameter = z
  .string()
  .regex(
    /^(seedDecay\.shallow|seedDecay\.deep|floweringProbability|overWinterSurvival|germination\.deep|germination\.shallowByAge\[\d{1,2}\])$/,
    'Not a profile parameter an estimate can be adopted into',
  );

/**
 * An estimate that can become a parameter. `value` is a fraction for profile parameters,
 * {mean, sd} for a step's efficacy, seeds/m² per layer for a field's initial seedbank.
 */
export const adoptable = z.object({
  key: z.string(),
  /** What the estimate is, e.g. "glyphosate spot, 4 WAT". */
  label: z.string(),
  target: z.enum(['profile', 'step', 'field-seedbank']),
  /** For profile targets: the parameters it fits, best first. */
  parameters: z.array(z.string()),
  fraction: z.number().nullable(),
  efficacy: z.object({ mean: z.number(), sd: z.number() }).nullable(),
  layers: z.array(z.object({ layer: z.string(), seedsPerM2: z.number() })).nullable(),
  /** Whether it can be adopted as it stands, and why not. */
  ok: z.boolean(),
  reason: z.string().nullable(),
  /** The source note the parameter gets. */
  note: z.string(),
  sources: z.array(sourceRef),
});
export type Adoptable = z.infer<typeof adoptable>;

const countDensity = z.object({
  samples: z.number(),
  count: z.number(),
  areaM2: z.number(),
  perM2: estimateSchema,
  perFt2: estimateSchema,
  method: z.enum(['exact-poisson', 'negative-binomial']),
  reason: z.string(),
  k: z.number().nullable(),
});

export const seedbankYear = z.object({
  year: z.number(),
  method: z.enum(['seeds-counted', 'seedlings-emerged', 'mixed']),
  layers: z.array(countDensity.extend({ layer: z.string(), cores: z.number() })),
  sources: z.array(sourceRef),
  adopt: adoptable,
});

export const decayView = z.object({
  layer: z.string(),
  observations: z.array(z.object({ year: z.number(), seedsPerM2: z.number() })),
  result: z
    .object({
      df: z.number(),
      slope: z.number(),
      slopeStandardError: z.number(),
      intercept: z.number(),
      rSquared: z.number().nullable(),
      annualSurvival: estimateSchema,
      decayRate: estimateSchema,
      halfLifeYears: z.number().nullable(),
    })
    .nullable(),
  problem: z.string().nullable(),
  adopt: adoptable.nullable(),
});

export const transitionView = z.object({
  key: z.enum(['survival', 'flowering']),
  label: z.string(),
  /** How the rate is formed from the counts. */
  definition: z.string(),
  pooled: proportionSchema.nullable(),
  byYear: z.array(z.object({ year: z.number(), rate: proportionSchema })),
  problem: z.string().nullable(),
  adopt: adoptable.nullable(),
});

export const germinationView = z.object({
  upload: sourceRef,
  tests: z.array(
    z.object({
      testId: z.string(),
      temperatureC: z.number(),
      seeds: z.number(),
      fraction: proportionSchema,
      t50Days: z.number().nullable(),
      /** Day and cumulative fraction germinated, for the curves. */
      curve: z.array(z.object({ day: z.number(), fraction: z.number() })),
    }),
  ),
  temperatures: z.array(
    z.object({
      temperatureC: z.number(),
      tests: z.number(),
      fraction: proportionSchema,
      t50Days: z
        .object({
          meanDays: z.number(),
          lower: z.number().nullable(),
          upper: z.number().nullable(),
          confidence: z.number(),
          dishes: z.number(),
        })
        .nullable(),
      adopt: adoptable,
    }),
  ),
  best: z.object({ temperatureC: z.number(), tiedTemperaturesC: z.array(z.number()) }).nullable(),
  problem: z.string().nullable(),
});

const anovaRow = z.object({
  df: z.number(),
  ss: z.number(),
  ms: z.number().nullable(),
  f: z.number().nullable(),
  p: z.number().nullable(),
});

export const efficacyTiming = z.object({
  timing: z.string().nullable(),
  checkMean: z.number(),
  anova: z.object({
    treatments: z.array(z.string()),
    blocks: z.array(z.string()),
    means: z.array(z.number()),
    grandMean: z.number(),
    blocksRow: anovaRow,
    treatmentsRow: anovaRow,
    errorRow: anovaRow,
    totalRow: anovaRow,
    cvPercent: z.number(),
  }),
  lsd: z.object({
    method: z.literal("Fisher's LSD"),
    alpha: z.number(),
    lsd: z.number(),
    fTestSignificant: z.boolean(),
    comparisons: z.array(
      z.object({ a: z.string(), b: z.string(), difference: z.number(), significant: z.boolean() }),
    ),
  }),
  treatments: z.array(
    z.object({
      treatment: z.string(),
      meanResponse: z.number(),
      percentControl: z.number(),
      perBlock: z.array(z.object({ block: z.string(), percentControl: z.number() })),
      meanPercentControl: z.number(),
      sdPercentControl: z.number(),
      /** t interval of the mean per-block % control (r − 1 df). */
      interval: estimateSchema,
      adopt: adoptable,
    }),
  ),
});

export const efficacyView = z.object({
  upload: sourceRef,
  trial: z.string(),
  check: z.string(),
  responseNote: z.string(),
  timings: z.array(efficacyTiming),
  problem: z.string().nullable(),
});

export const fieldEstimates = z.object({
  fieldId: z.string(),
  seedbank: z.object({
    years: z.array(seedbankYear),
    decay: z.array(decayView),
    problem: z.string().nullable(),
  }),
  plants: z.object({
    densities: z.array(countDensity.extend({ year: z.number(), stage: z.string() })),
    transitions: z.array(transitionView),
    problem: z.string().nullable(),
    sources: z.array(sourceRef),
  }),
  germination: z.array(germinationView),
  efficacy: z.array(efficacyView),
});
export type FieldEstimates = z.infer<typeof fieldEstimates>;

export const previewReport = z.object({
  kind: recordKind,
  filename: z.string(),
  sha256: z.string(),
  bytes: z.number(),
  /** "comma", "semicolon" or "tab"; null when the file could not be read that far. */
  delimiter: z.enum(['comma', 'semicolon', 'tab']).nullable(),
  columns: z.array(columnUse),
  rowCount: z.number(),
  /** The first rows and every row with a problem. */
  rows: z.array(previewRow),
  problems: z.array(recordProblem),
  warnings: z.array(z.string()),
  /** Treatment names found in an efficacy trial, to pick the untreated check from. */
  treatments: z.array(z.string()),
  /** The field's estimates as they would be after importing this file; null while the file has problems. */
  estimates: fieldEstimates.nullable(),
  /** True when the file can be imported as it stands. */
  importable: z.boolean(),
});
export type PreviewReport = z.infer<typeof previewReport>;

export const uploadView = z.object({
  id: z.string(),
  kind: recordKind,
  filename: z.string(),
  contentType: z.string(),
  bytes: z.number(),
  sha256: z.string(),
  rowCount: z.number(),
  check: z.string().nullable(),
  uploadedBy: z.string().nullable(),
  uploadedAt: z.string(),
});
export type UploadView = z.infer<typeof uploadView>;

export const adoptTarget = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('profile'), profileId: idParam, parameter: adoptableParameter }),
    z.strictObject({
      kind: z.literal('step'),
      strategyId: idParam,
      stepIndex: z.number().int('Step index must be a whole number').min(0).max(199),
    }),
    z.strictObject({
      kind: z.literal('field-seedbank'),
      shallowLayers: z.array(z.string().trim().min(1).max(200)).max(20),
      deepLayers: z.array(z.string().trim().min(1).max(200)).max(20),
    }),
  ],
  { error: 'Choose a target: profile, step or field-seedbank' },
);
export type AdoptTarget = z.infer<typeof adoptTarget>;

export const adoptBody = z.strictObject({
  estimateKey: z.string().min(1, 'Name the estimate to adopt').max(2000),
  target: adoptTarget,
});
export type AdoptBody = z.infer<typeof adoptBody>;

export const adoptionView = z.object({
  id: z.string(),
  estimateKey: z.string(),
  estimateLabel: z.string(),
  targetKind: z.enum(['profile', 'step', 'field-seedbank']),
  targetId: z.string(),
  /** Profile name, strategy name or field name at the time of adoption. */
  targetName: z.string(),
  /** e.g. "seedDecay.shallow", "steps[1].efficacy", "initialSeedbank". */
  path: z.string(),
  /** What the step or parameter is called, e.g. "Seed decay, shallow layer" or the step label. */
  pathLabel: z.string(),
  previous: z.unknown(),
  value: z.unknown(),
  note: z.string(),
  sources: z.array(sourceRef),
  /** False once the target changed since (the step was edited or moved, the value replaced). */
  current: z.boolean(),
  adoptedBy: z.string().nullable(),
  adoptedAt: z.string(),
});
export type AdoptionView = z.infer<typeof adoptionView>;

/** Source notes of a strategy's steps, keyed like "steps[1].efficacy" (only notes still current). */
export const stepSources = z.record(z.string(), z.string());
