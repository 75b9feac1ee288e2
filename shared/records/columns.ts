// What each kind of field-record upload holds, column by column: the header(s) it may
// carry, the unit the value is stored in, how other units are converted, whether it is
// required and what it means. The server validates uploads with this table, the
// templates are written from it and the upload page explains it, so the three agree.
import { fahrenheitToCelsius, SQUARE_METRES_PER_SQUARE_FOOT } from '../../models/records/units';

export const recordKinds = [
  'seedbank-samples',
  'plant-counts',
  'germination-tests',
  'efficacy-trials',
] as const;
export type RecordKind = (typeof recordKinds)[number];

/** NIST SP 811 (2008), Appendix B: 1 in = 2.54 cm exactly. */
export const CENTIMETRES_PER_INCH = 2.54;

export type ColumnType = 'text' | 'date' | 'year' | 'count' | 'number' | 'stage';

/** A unit a quantity may be written in, and how it becomes the stored unit. */
export interface UnitForm {
  /** As shown: "°F", "in", "ft²". */
  unit: string;
  toBase: (value: number) => number;
  /** How the value is converted, with the source of the factor; null for the stored unit itself. */
  rule: string | null;
}

/** One way a column can appear in the header: its name, and its unit when the name carries one. */
export interface HeaderForm {
  header: string;
  /** Other spellings accepted for this header (after normalising, see `normaliseHeader`). */
  aliases?: readonly string[];
  unit?: UnitForm;
  /** Recorded with the upload when this form is used, e.g. which counting method the count is. */
  tag?: string;
  /** The unit is given per row in this column instead of in the header. */
  unitColumn?: { header: string; units: Readonly<Record<string, UnitForm>> };
}

export interface ColumnSpec {
  /** Property of the stored row. */
  key: string;
  label: string;
  type: ColumnType;
  /** The unit the value is stored in; null for labels and counts of things named in the label. */
  unit: string | null;
  required: boolean;
  /** Exactly one of these may appear in the header. */
  forms: readonly HeaderForm[];
  description: string;
  /** For number columns: the smallest value allowed, and whether it is itself allowed. */
  min?: { value: number; inclusive: boolean };
}

export interface KindSpec {
  kind: RecordKind;
  title: string;
  /** One line saying what the upload gives. */
  summary: string;
  columns: readonly ColumnSpec[];
  /** A sample row per column key, written as a comment in the template. */
  example: Readonly<Record<string, string>>;
  /** Extra lines for the template's header comment. */
  notes: readonly string[];
}

const CELSIUS: UnitForm = { unit: '°C', toBase: (v) => v, rule: null };
const FAHRENHEIT: UnitForm = {
  unit: '°F',
  toBase: fahrenheitToCelsius,
  rule: '°F converted to °C: t/°C = (t/°F − 32) × 5/9 (NIST SP 811, Appendix B)',
};
const CENTIMETRE: UnitForm = { unit: 'cm', toBase: (v) => v, rule: null };
const INCH: UnitForm = {
  unit: 'in',
  toBase: (v) => v * CENTIMETRES_PER_INCH,
  rule: 'inches converted to cm × 2.54 exactly (NIST SP 811, Appendix B: 1 in = 2.54 cm)',
};
const SQUARE_METRE: UnitForm = { unit: 'm²', toBase: (v) => v, rule: null };
const SQUARE_FOOT: UnitForm = {
  unit: 'ft²',
  toBase: (v) => v * SQUARE_METRES_PER_SQUARE_FOOT,
  rule: 'ft² converted to m² × 0.09290304 exactly (NIST SP 811, Appendix B: 1 ft = 0.3048 m)',
};

const fieldColumn: ColumnSpec = {
  key: 'field',
  label: 'Field',
  type: 'text',
  unit: null,
  required: true,
  forms: [{ header: 'field' }],
  description: 'the field the records come from; one upload holds one field',
};

export const kindSpecs: Readonly<Record<RecordKind, KindSpec>> = {
  'seedbank-samples': {
    kind: 'seedbank-samples',
    title: 'Soil seedbank samples',
    summary: 'Seeds (or emerged seedlings) per soil sample → seeds/m² per layer, and seed decay over years.',
    columns: [
      fieldColumn,
      {
        key: 'date',
        label: 'Sampling date',
        type: 'date',
        unit: null,
        required: true,
        forms: [{ header: 'date', aliases: ['sampling_date', 'sampled'] }],
        description:
          'the day the cores were taken, as YYYY-MM-DD; its year places the sample in a time series',
      },
      {
        key: 'layer',
        label: 'Layer',
        type: 'text',
        unit: null,
        required: true,
        forms: [{ header: 'layer', aliases: ['depth', 'layer_depth'] }],
        description:
          'the soil layer the cores were cut into, as a label such as 0-5 cm or 0-2 in; samples are grouped by it (list the shallow layer first)',
      },
      {
        key: 'coreDiameterCm',
        label: 'Core diameter',
        type: 'number',
        unit: 'cm',
        required: true,
        forms: [
          { header: 'core_diameter_cm', unit: CENTIMETRE },
          { header: 'core_diameter_in', unit: INCH },
        ],
        description: 'inside diameter of the corer (core_diameter_cm in cm, or core_diameter_in in inches)',
        min: { value: 0, inclusive: false },
      },
      {
        key: 'cores',
        label: 'Number of cores',
        type: 'count',
        unit: 'cores',
        required: true,
        forms: [{ header: 'cores', aliases: ['number_of_cores', 'n_cores'] }],
        description: 'cores pooled into this sample (1 for a single core)',
        min: { value: 1, inclusive: true },
      },
      {
        key: 'count',
        label: 'Seeds counted or seedlings emerged',
        type: 'count',
        unit: 'seeds',
        required: true,
        forms: [
          { header: 'seeds_counted', aliases: ['seeds'], tag: 'seeds-counted' },
          { header: 'seedlings_emerged', aliases: ['seedlings'], tag: 'seedlings-emerged' },
        ],
        description:
          'seeds extracted and counted in the sample (seeds_counted), or seedlings that emerged from it in trays (seedlings_emerged); give one of the two columns',
      },
    ],
    example: {
      field: 'Hollow Lane block',
      date: '2026-03-10',
      layer: '0-5 cm',
      coreDiameterCm: '5',
      cores: '1',
      count: '4',
    },
    notes: ['One row per sample. Upload one file per sampling, or several years in one file.'],
  },
  'plant-counts': {
    kind: 'plant-counts',
    title: 'Plant counts',
    summary:
      'Plants per quadrat by stage and year → plants/m², survival and flowering fraction with binomial intervals.',
    columns: [
      fieldColumn,
      {
        key: 'year',
        label: 'Year',
        type: 'year',
        unit: null,
        required: true,
        forms: [{ header: 'year' }],
        description: 'the year of the survey (e.g. 2026)',
      },
      {
        key: 'quadrat',
        label: 'Quadrat',
        type: 'text',
        unit: null,
        required: true,
        forms: [{ header: 'quadrat', aliases: ['quadrat_id'] }],
        description: 'the permanent quadrat, so the same plants can be followed from year to year',
      },
      {
        key: 'quadratAreaM2',
        label: 'Quadrat size',
        type: 'number',
        unit: 'm²',
        required: true,
        forms: [
          { header: 'quadrat_size_m2', aliases: ['quadrat_area_m2'], unit: SQUARE_METRE },
          { header: 'quadrat_size_ft2', aliases: ['quadrat_area_ft2'], unit: SQUARE_FOOT },
        ],
        description: 'area of the quadrat (quadrat_size_m2 in m², or quadrat_size_ft2 in ft²)',
        min: { value: 0, inclusive: false },
      },
      {
        key: 'stage',
        label: 'Stage',
        type: 'stage',
        unit: null,
        required: true,
        forms: [{ header: 'stage' }],
        description:
          'seedling, rosette or flowering; a flowering plant is counted as flowering only, not also as a rosette',
      },
      {
        key: 'count',
        label: 'Plants',
        type: 'count',
        unit: 'plants',
        required: true,
        forms: [{ header: 'count', aliases: ['plants'] }],
        description: 'plants of that stage in the quadrat',
      },
    ],
    example: {
      field: 'Hollow Lane block',
      year: '2026',
      quadrat: 'Q1',
      quadratAreaM2: '0.25',
      stage: 'rosette',
      count: '6',
    },
    notes: [
      'One row per quadrat, year and stage; a stage left out of a surveyed quadrat-year counts as 0.',
      'Survival and flowering fractions follow the same quadrats from year to year (tagged plants or a closed cohort).',
    ],
  },
  'germination-tests': {
    kind: 'germination-tests',
    title: 'Germination tests',
    summary:
      'Cumulative germination per dish and day → final fraction per temperature, T50 and the best temperature.',
    columns: [
      {
        key: 'testId',
        label: 'Test id',
        type: 'text',
        unit: null,
        required: true,
        forms: [{ header: 'test_id', aliases: ['test', 'dish', 'dish_id'] }],
        description: 'one dish (one replicate of seeds) followed over time',
      },
      {
        key: 'temperatureC',
        label: 'Temperature',
        type: 'number',
        unit: '°C',
        required: true,
        forms: [
          { header: 'temperature_c', unit: CELSIUS },
          { header: 'temperature_f', unit: FAHRENHEIT },
          {
            header: 'temperature',
            unitColumn: {
              header: 'temperature_unit',
              units: { c: CELSIUS, celsius: CELSIUS, f: FAHRENHEIT, fahrenheit: FAHRENHEIT },
            },
          },
        ],
        description:
          'incubation temperature: temperature_c in °C, temperature_f in °F, or temperature with a temperature_unit column (C or F) per row',
      },
      {
        key: 'seeds',
        label: 'Seeds per dish',
        type: 'count',
        unit: 'seeds',
        required: true,
        forms: [{ header: 'seeds_per_dish', aliases: ['seeds'] }],
        description: 'seeds set out in the dish',
        min: { value: 1, inclusive: true },
      },
      {
        key: 'day',
        label: 'Day',
        type: 'number',
        unit: 'days',
        required: true,
        forms: [{ header: 'day', aliases: ['days'] }],
        description: 'days since the seeds were set to germinate (day 0 = sowing)',
        min: { value: 0, inclusive: true },
      },
      {
        key: 'germinated',
        label: 'Cumulative germinated',
        type: 'count',
        unit: 'seeds',
        required: true,
        forms: [{ header: 'cumulative_germinated', aliases: ['germinated'] }],
        description: 'seeds germinated in the dish so far (a running total, never above the seeds per dish)',
      },
    ],
    example: { testId: 'D20-1', temperatureC: '20', seeds: '50', day: '7', germinated: '18' },
    notes: ['One row per dish and count day.'],
  },
  'efficacy-trials': {
    kind: 'efficacy-trials',
    title: 'Efficacy trials',
    summary:
      'Weed response per plot of a randomised complete block trial → % control against the untreated check, ANOVA and Fisher’s LSD.',
    columns: [
      {
        key: 'trial',
        label: 'Trial',
        type: 'text',
        unit: null,
        required: true,
        forms: [{ header: 'trial' }],
        description: 'the trial name; several trials in one file are analysed apart',
      },
      {
        key: 'treatment',
        label: 'Treatment',
        type: 'text',
        unit: null,
        required: true,
        forms: [{ header: 'treatment' }],
        description:
          'the treatment by active ingredient (common name) or practice, and the untreated check, named as in the upload form',
      },
      {
        key: 'block',
        label: 'Block',
        type: 'text',
        unit: null,
        required: true,
        forms: [{ header: 'block', aliases: ['replicate', 'rep'] }],
        description: 'the block (replicate); every treatment once in every block',
      },
      {
        key: 'timing',
        label: 'Assessment timing',
        type: 'text',
        unit: null,
        required: true,
        forms: [{ header: 'timing', aliases: ['assessment', 'assessment_timing'] }],
        description:
          'when the plots were assessed, e.g. 2 WAT (weeks after treatment); each timing is analysed apart',
      },
      {
        key: 'response',
        label: 'Response',
        type: 'number',
        unit: null,
        required: true,
        forms: [{ header: 'response' }],
        description: 'weed biomass or plant count on the plot (≥ 0; lower is better control)',
        min: { value: 0, inclusive: true },
      },
    ],
    example: {
      trial: 'Hollow Lane 2026',
      treatment: 'untreated check',
      block: 'I',
      timing: '4 WAT',
      response: '42',
    },
    notes: [
      'One row per plot and assessment timing. Name the untreated check in the upload form.',
      'Rates are not part of the file: take them from the product label.',
    ],
  },
};

/**
 * Headers are compared after normalising: lower case, units written plainly ("(°F)" → "_f",
 * "m²" → "m2"), anything else that is not a letter or digit becomes one underscore. So
 * "Temperature (°F)", "temperature_f" and "TEMPERATURE F" are the same column.
 */
export function normaliseHeader(header: string): string {
  return header
    .normalize('NFKC')
    .toLowerCase()
    .replace(/°/g, '')
    .replace(/²/g, '2')
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_+|_+$/g, '');
}

export const stageNames = ['seedling', 'rosette', 'flowering'] as const;
export type StageName = (typeof stageNames)[number];
