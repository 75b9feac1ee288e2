// zod schemas of a scenario (types in models/scenario/types.ts). Objects are strict:
// an unknown key is an error, so a misspelt field never falls back to a default silently.
import { z } from 'zod';
import {
  allowedTimings,
  actionPoint,
  stepKinds,
  targetStages,
  targetsAllowedAt,
  timings,
} from '../../models/scenario/step-kinds';
import type { StepKind, Timing, TargetStage } from '../../models/scenario/types';
import { choiceField, numberField, recordOf, show, textField } from './fields';

const layerValues = (
  what: string,
  shallow: Parameters<typeof numberField>[0],
  deep: Parameters<typeof numberField>[0],
) => recordOf(what, { shallow: numberField(shallow), deep: numberField(deep) });

const establishmentDensity = z.discriminatedUnion(
  'kind',
  [
    recordOf('a Beverton–Holt crowding', {
      kind: z.literal('beverton-holt'),
      c: numberField('profile.establishment.density.c'),
    }),
    recordOf('an establishment ceiling', {
      kind: z.literal('ceiling'),
      K: numberField('profile.establishment.density.K'),
    }),
  ],
  {
    error: (iss) =>
      `${show((iss.input as { kind?: unknown } | undefined)?.kind)} is not a crowding kind (beverton-holt or ceiling)`,
  },
);

export const profileSchema = recordOf('a species profile', {
  name: textField('the profile name'),
  lifeForm: choiceField(['annual', 'biennial', 'perennial']),
  fecundity: recordOf('fecundity', {
    maxSeedsPerPlant: numberField('profile.fecundity.maxSeedsPerPlant'),
    densityCoefficient: numberField('profile.fecundity.densityCoefficient'),
    aggregation: numberField('profile.fecundity.aggregation').optional(),
  }),
  germination: recordOf('germination', {
    shallowByAge: z.array(numberField('profile.germination.shallowByAge[]'), {
      error: (iss) => `${show(iss.input)} is not a list of fractions (one per age class)`,
    }),
    deep: numberField('profile.germination.deep'),
  }),
  seedDecay: layerValues('seed decay by layer', 'profile.seedDecay.shallow', 'profile.seedDecay.deep'),
  ageClasses: numberField('profile.ageClasses'),
  establishment: recordOf('establishment', {
    survival: numberField('profile.establishment.survival'),
    density: establishmentDensity,
  }),
  floweringProbability: numberField('profile.floweringProbability'),
  overWinterSurvival: numberField('profile.overWinterSurvival'),
  rootCrownRegrowth: numberField('profile.rootCrownRegrowth'),
  fragmentEstablishment: numberField('profile.fragmentEstablishment'),
  seedRainLoss: numberField('profile.seedRainLoss'),
  environment: recordOf('environmental variation', {
    germinationCv: numberField('profile.environment.germinationCv'),
    establishmentCv: numberField('profile.environment.establishmentCv'),
    fecundityCv: numberField('profile.environment.fecundityCv'),
  }),
}).check((ctx) => {
  const p = ctx.value;
  const n = p.germination.shallowByAge.length;
  if (n < 1 || n > p.ageClasses) {
    ctx.issues.push({
      code: 'custom',
      input: n,
      path: ['germination', 'shallowByAge'],
      message: `has ${n} values for ${p.ageClasses} age classes; give 1 to ${p.ageClasses} (the last value covers older classes)`,
    });
  }
  if (p.lifeForm === 'annual' && p.overWinterSurvival !== 0) {
    ctx.issues.push({
      code: 'custom',
      input: p.overWinterSurvival,
      path: ['overWinterSurvival'],
      message: `${p.overWinterSurvival} must be 0 for an annual (annual plants do not live through the winter)`,
    });
  }
});

export const fieldSchema = recordOf('a field', {
  name: textField('the field name'),
  areaHa: numberField('field.areaHa'),
  initialSeedbank: layerValues(
    'the initial seedbank by layer',
    'field.initialSeedbank.shallow',
    'field.initialSeedbank.deep',
  ),
  initialPlants: numberField('field.initialPlants'),
  immigrantSeedRain: numberField('field.immigrantSeedRain'),
  cropValuePerHa: numberField('field.cropValuePerHa'),
  yieldLoss: recordOf('the yield-loss parameters', {
    I: numberField('field.yieldLoss.I'),
    A: numberField('field.yieldLoss.A'),
  }),
  cropCompetition: numberField('field.cropCompetition'),
});

const meanSdEfficacy = recordOf('an efficacy (mean, sd)', {
  mean: numberField('strategy.steps[].efficacy.mean'),
  sd: numberField('strategy.steps[].efficacy.sd'),
}).check((ctx) => {
  const { mean, sd } = ctx.value;
  // A beta distribution on [0, 1] with this mean exists only when sd² < mean(1 − mean).
  const largest = Math.sqrt(mean * (1 - mean));
  if (sd > 0 && !(sd < largest)) {
    ctx.issues.push({
      code: 'custom',
      input: sd,
      path: ['sd'],
      message: `${sd} is too large for a mean of ${mean}: a spread on 0–1 needs sd below ${largest.toFixed(4)} (fraction)`,
    });
  }
});

const rangeEfficacy = recordOf('an efficacy (min, mode, max)', {
  min: numberField('strategy.steps[].efficacy.min'),
  mode: numberField('strategy.steps[].efficacy.mode'),
  max: numberField('strategy.steps[].efficacy.max'),
}).check((ctx) => {
  const { min, mode, max } = ctx.value;
  if (!(min <= mode && mode <= max)) {
    ctx.issues.push({
      code: 'custom',
      input: ctx.value,
      path: [],
      message: `min ${min}, mode ${mode}, max ${max} must satisfy min ≤ mode ≤ max`,
    });
  }
});

/** {mean, sd} or {min, mode, max}, chosen by the keys present so messages speak of one form only. */
const efficacy = z.unknown().transform((value, ctx) => {
  const form =
    value !== null && typeof value === 'object' && ('min' in value || 'mode' in value || 'max' in value)
      ? rangeEfficacy
      : meanSdEfficacy;
  const result = form.safeParse(value);
  if (result.success) return result.data;
  for (const issue of result.error.issues) ctx.issues.push({ ...issue, input: value } as never);
  return z.NEVER;
});

const schedule = z.discriminatedUnion(
  'kind',
  [
    recordOf('an every-year schedule', { kind: z.literal('every-year') }),
    recordOf('an every-k-years schedule', {
      kind: z.literal('every-k-years'),
      k: numberField('strategy.steps[].schedule.k'),
      start: numberField('strategy.steps[].schedule.start'),
    }),
    recordOf('a year-range schedule', {
      kind: z.literal('year-range'),
      first: numberField('strategy.steps[].schedule.first'),
      last: numberField('strategy.steps[].schedule.last'),
    }),
  ],
  {
    error: (iss) =>
      `${show((iss.input as { kind?: unknown } | undefined)?.kind)} is not a schedule kind (every-year, every-k-years or year-range)`,
  },
);

// The rate is the user's, copied from the label; it may be left out (the product never
// fills one in), but a rate needs its unit and a unit its rate.
const chemical = recordOf('chemical details', {
  activeIngredient: textField('the active ingredient as on the label'),
  rate: numberField('strategy.steps[].chemical.rate').optional(),
  rateUnit: textField('the rate unit as on the label').optional(),
}).check((ctx) => {
  const { rate, rateUnit } = ctx.value;
  if ((rate === undefined) !== (rateUnit === undefined)) {
    ctx.issues.push({
      code: 'custom',
      input: ctx.value,
      path: [rate === undefined ? 'rate' : 'rateUnit'],
      message:
        rate === undefined
          ? 'is required when a rate unit is given'
          : 'is required when a rate is given (e.g. the unit on the label)',
    });
  }
});

const targets = z.array(choiceField(targetStages), {
  error: (iss) => `${show(iss.input)} is not a list of target stages`,
});

const common = {
  label: textField('the step name'),
  timing: choiceField(timings),
  schedule,
  efficacy,
  cost: recordOf('a cost per ha', {
    material: numberField('strategy.steps[].cost.material'),
    application: numberField('strategy.steps[].cost.application'),
  }),
};

const stepKind = <K extends StepKind, S extends z.ZodRawShape>(kind: K, extra: S) =>
  recordOf(`a ${kind} step`, { kind: z.literal(kind), ...common, ...extra });

const stepSchema = z
  .discriminatedUnion(
    'kind',
    [
      stepKind('pre-emergence-herbicide', { chemical: chemical.optional() }),
      stepKind('post-emergence-herbicide', {
        targets,
        topKill: numberField('strategy.steps[].topKill'),
        chemical: chemical.optional(),
      }),
      stepKind('spot-treatment', {
        targets,
        topKill: numberField('strategy.steps[].topKill'),
        chemical: chemical.optional(),
      }),
      stepKind('mowing', {
        seedsPerPlantReduction: numberField('strategy.steps[].seedsPerPlantReduction'),
        seedReturnReduction: numberField('strategy.steps[].seedReturnReduction'),
      }),
      stepKind('hand-removal-with-crown', { targets }),
      stepKind('hand-removal-leaving-crown', { targets }),
      stepKind('cultivation', {
        targets,
        burial: numberField('strategy.steps[].burial'),
        exhumation: numberField('strategy.steps[].exhumation'),
        fragmentsPerPlant: numberField('strategy.steps[].fragmentsPerPlant'),
      }),
      stepKind('mulch', {}),
      stepKind('seed-set-prevention', {
        seedsPerPlantReduction: numberField('strategy.steps[].seedsPerPlantReduction'),
        seedReturnReduction: numberField('strategy.steps[].seedReturnReduction'),
      }),
      stepKind('crop-competition', {}),
    ],
    {
      error: (iss) =>
        iss.input !== null && typeof iss.input === 'object'
          ? `${show((iss.input as { kind?: unknown }).kind)} is not a step kind (one of ${stepKinds.join(', ')})`
          : `${show(iss.input)} is not a step`,
    },
  )
  .check((ctx) => {
    const step = ctx.value;
    const allowed = allowedTimings(step.kind);
    if (!allowed.includes(step.timing)) {
      ctx.issues.push({
        code: 'custom',
        input: step.timing,
        path: ['timing'],
        message: `"${step.timing}" is not a timing for ${step.kind}; use ${allowed.join(' or ')}`,
      });
      return;
    }
    if ('targets' in step) checkTargets(step.targets, step.timing, step.kind, ctx.issues);
  });

function checkTargets(
  list: readonly TargetStage[],
  timing: Timing,
  kind: StepKind,
  issues: z.core.$ZodRawIssue[],
): void {
  if (list.length === 0) {
    issues.push({
      code: 'custom',
      input: list,
      path: ['targets'],
      message: 'needs at least one target stage (seedlings, rosettes, flowering)',
    });
    return;
  }
  const reachable = targetsAllowedAt(actionPoint(kind, timing));
  list.forEach((stage, i) => {
    if (!reachable.includes(stage)) {
      issues.push({
        code: 'custom',
        input: stage,
        path: ['targets', i],
        message: `"${stage}" cannot be targeted in ${timing}: plants flower after the spring steps; time the step summer, late-summer or fall`,
      });
    } else if (list.indexOf(stage) !== i) {
      issues.push({
        code: 'custom',
        input: stage,
        path: ['targets', i],
        message: `"${stage}" is listed twice`,
      });
    }
  });
}

export const strategySchema = recordOf('a strategy', {
  name: textField('the strategy name'),
  steps: z.array(stepSchema, { error: (iss) => `${show(iss.input)} is not a list of steps` }),
});

export const scenarioSchema = recordOf('a scenario', {
  profile: profileSchema,
  field: fieldSchema,
  strategy: strategySchema,
  horizonYears: numberField('horizonYears'),
  replicates: numberField('replicates'),
  seed: numberField('seed'),
  efficacyDraw: choiceField(['per-replicate', 'per-application']),
  depletionThreshold: numberField('depletionThreshold'),
  discountRate: numberField('discountRate'),
  letItSeedYear: numberField('letItSeedYear').optional(),
}).check((ctx) => {
  const H = ctx.value.horizonYears;
  const letItSeed = ctx.value.letItSeedYear;
  if (letItSeed !== undefined && letItSeed > H) {
    ctx.issues.push({
      code: 'custom',
      input: letItSeed,
      path: ['letItSeedYear'],
      message: `year ${letItSeed} is outside the horizon 1–${H} (years)`,
    });
  }
  ctx.value.strategy.steps.forEach((step, i) => {
    const s = step.schedule;
    const at = (key: string) => ['strategy', 'steps', i, 'schedule', key];
    const outside = (key: string, year: number) =>
      ctx.issues.push({
        code: 'custom',
        input: year,
        path: at(key),
        message: `year ${year} is outside the horizon 1–${H} (years)`,
      });
    if (s.kind === 'every-k-years' && s.start > H) outside('start', s.start);
    if (s.kind === 'year-range') {
      if (s.first > H) outside('first', s.first);
      if (s.last > H) outside('last', s.last);
      if (s.first > s.last) {
        ctx.issues.push({
          code: 'custom',
          input: s,
          path: at('last'),
          message: `last year ${s.last} is before first year ${s.first}`,
        });
      }
    }
  });
});
