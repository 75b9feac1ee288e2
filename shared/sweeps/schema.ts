// The part of a sweep definition the server and the command line share: what to vary, how
// to place the points, what to record. Only the shape is checked here; whether a path is a
// parameter of the scenario and whether the range is valid needs the scenario (see plan.ts).
import { z } from 'zod';
import { numberField } from '../scenario/fields';
import { outcomeKinds } from './outcomes';

const count = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .int(`${what} must be a whole number`)
    .min(0, `${what} must not be negative`);

export const sweepDesignSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('one-at-a-time') }),
    z.strictObject({ kind: z.literal('factorial'), levels: count('Levels') }),
    z.strictObject({ kind: z.literal('latin-hypercube'), points: count('Points') }),
    z.strictObject({ kind: z.literal('sobol'), baseSamples: count('Base samples') }),
  ],
  { error: 'Design kind must be one-at-a-time, factorial, latin-hypercube or sobol' },
);

const finite = (what: string) =>
  z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be a finite number`);

export const sweepParameterSchema = z.strictObject({
  path: z.string().trim().min(1, 'Pick a parameter').max(200, 'A parameter path has at most 200 characters'),
  min: finite('Min'),
  max: finite('Max'),
});

export const sweepSpecShape = {
  parameters: z.array(sweepParameterSchema).max(20, 'A sweep varies at most 20 parameters'),
  design: sweepDesignSchema,
  outcomes: z
    .array(z.enum(outcomeKinds, { error: `Outcome must be one of ${outcomeKinds.join(', ')}` }))
    .min(1, 'Pick at least one outcome')
    .refine((list) => new Set(list).size === list.length, 'An outcome is listed twice'),
  outcomeYear: z
    .number({ error: 'Year T must be a number' })
    .int('Year T must be a whole number')
    .min(1, 'Year T must be 1 or later'),
  replicatesPerPoint: numberField('replicates'),
  seed: numberField('seed'),
};

export const sweepSpecSchema = z.strictObject(sweepSpecShape);
export type SweepSpec = z.infer<typeof sweepSpecSchema>;
