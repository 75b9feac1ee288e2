// A projection matrix given directly, as analysts write it:
// {"stages": [...], "matrix": [[...]]} with matrix[i][j] the contribution of stage j in
// year t to stage i in year t+1.
import { z } from 'zod';

const entry = z
  .number({ error: (iss) => `${JSON.stringify(iss.input) ?? 'nothing'} is not a number` })
  .check((ctx) => {
    if (ctx.value < 0)
      ctx.issues.push({
        code: 'custom',
        input: ctx.value,
        message: `${ctx.value} is negative; projection matrix entries are ≥ 0`,
      });
  });

export const matrixInputSchema = z
  .strictObject(
    {
      stages: z.array(z.string({ error: 'stage names must be text' }), {
        error: 'stages must be a list of stage names',
      }),
      matrix: z.array(z.array(entry, { error: 'each matrix row must be a list of numbers' }), {
        error: 'matrix must be a list of rows',
      }),
    },
    {
      error: (iss) =>
        iss.code === 'unrecognized_keys'
          ? `unknown field(s) ${iss.keys.map((k) => JSON.stringify(k)).join(', ')}; expected "stages" and "matrix"`
          : 'expected an object {"stages": [...], "matrix": [[...]]}',
    },
  )
  .check((ctx) => {
    const { stages, matrix } = ctx.value;
    const n = stages.length;
    if (n === 0)
      ctx.issues.push({
        code: 'custom',
        input: stages,
        path: ['stages'],
        message: 'needs at least one stage',
      });
    if (matrix.length !== n) {
      ctx.issues.push({
        code: 'custom',
        input: matrix,
        path: ['matrix'],
        message: `has ${matrix.length} rows for ${n} stages`,
      });
    }
    matrix.forEach((row, i) => {
      if (row.length !== n)
        ctx.issues.push({
          code: 'custom',
          input: row,
          path: ['matrix', i],
          message: `has ${row.length} entries for ${n} stages`,
        });
    });
  });

export type MatrixInput = z.infer<typeof matrixInputSchema>;
