// Seedwake's command line for analysts and scripts: `project` runs a scenario and prints
// its summary (JSON or CSV), `analyze` prints the asymptotic analysis of a matrix, `sweep`
// runs a sensitivity sweep in worker threads and prints its points (JSON or tidy CSV).
// It validates with the same shared/ schemas and runs the same models/ functions as the
// server. Invalid input: exit code 2, a message on stderr, nothing on stdout.
import { readFileSync } from 'node:fs';
import { parseScenario, issueText } from '../../shared/scenario/parse';
import { hasChemicalStep, pesticideCautions } from '../../shared/scenario/cautions';
import { matrixInputSchema } from '../../shared/matrix/schema';
import { summaryToCsv } from '../../shared/projection/csv';
import { formatPath } from '../../shared/scenario/parse';
import { runProjection } from '../../models/projection/run';
import { analyzeMatrix } from '../../models/matrix/analysis';
import { sweepCsv } from '../../shared/sweeps/csv';
import { runLocalSweep, sweepFileSchema } from '../sweeps/local-run';
import { parseArgs } from './args';
import type { CliCommand } from './args';

/** Bad input: reported on stderr with exit code 2. */
class InputError extends Error {}

function readJson(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    throw new InputError(
      code === 'ENOENT' ? `${file}: no such file` : `${file}: cannot read (${(error as Error).message})`,
    );
  }
  try {
    return JSON.parse(text);
  } catch (error) {
    throw new InputError(`${file}: not valid JSON (${(error as Error).message})`);
  }
}

function project(cmd: Extract<CliCommand, { command: 'project' }>): string {
  const json = readJson(cmd.file);
  // Flags replace the file's values before validation, so their ranges (and schedule
  // years against a new horizon) are checked like any other input.
  const input = json !== null && typeof json === 'object' && !Array.isArray(json) ? { ...json } : json;
  if (input !== null && typeof input === 'object') {
    const target = input as Record<string, unknown>;
    if (cmd.seed !== undefined) target.seed = cmd.seed;
    if (cmd.replicates !== undefined) target.replicates = cmd.replicates;
    if (cmd.years !== undefined) target.horizonYears = cmd.years;
  }
  const parsed = parseScenario(input);
  if (!parsed.ok)
    throw new InputError(`${cmd.file}: invalid scenario\n${parsed.issues.map(issueText).join('\n')}`);
  const result = runProjection(parsed.scenario);
  if (cmd.format === 'csv') return summaryToCsv(result.summary);
  const cautions = hasChemicalStep(parsed.scenario.strategy) ? pesticideCautions : [];
  return `${JSON.stringify({ cautions, summary: result.summary, meanField: result.meanField }, null, 2)}\n`;
}

function analyze(cmd: Extract<CliCommand, { command: 'analyze' }>): string {
  const parsed = matrixInputSchema.safeParse(readJson(cmd.file));
  if (!parsed.success) {
    throw new InputError(
      `${cmd.file}: invalid matrix\n${parsed.error.issues.map((i) => `${formatPath(i.path, '(matrix file)')}: ${i.message}`).join('\n')}`,
    );
  }
  let analysis;
  try {
    analysis = analyzeMatrix(parsed.data.matrix);
  } catch (error) {
    // The analysis rejects matrices it cannot analyse (e.g. no life-cycle loop) with a RangeError.
    if (error instanceof RangeError) throw new InputError(`${cmd.file}: ${error.message}`);
    throw error;
  }
  const { lambda, stableStage, reproductiveValue, sensitivities, elasticities, dampingRatio } = analysis;
  // JSON has no Infinity: a damping ratio with no second eigenvalue is printed as null.
  return `${JSON.stringify({ lambda, stableStage, reproductiveValue, sensitivities, elasticities, dampingRatio }, null, 2)}\n`;
}

async function sweep(cmd: Extract<CliCommand, { command: 'sweep' }>): Promise<string> {
  const file = sweepFileSchema.safeParse(readJson(cmd.file));
  if (!file.success) {
    throw new InputError(
      `${cmd.file}: invalid sweep\n${file.error.issues.map((i) => `${formatPath(i.path, '(sweep file)')}: ${i.message}`).join('\n')}`,
    );
  }
  const parsed = parseScenario(file.data.scenario);
  if (!parsed.ok) {
    throw new InputError(
      `${cmd.file}: invalid scenario\n${parsed.issues.map((i) => `scenario.${i.path}: ${i.message}`).join('\n')}`,
    );
  }
  const run = await runLocalSweep(parsed.scenario, file.data, cmd.workers);
  if (!run.ok) {
    throw new InputError(
      `${cmd.file}: invalid sweep\n${Object.entries(run.problems)
        .map(([k, v]) => `${k}: ${v}`)
        .join('\n')}`,
    );
  }
  const { plan, points } = run.result;
  const d = file.data;
  if (cmd.format === 'csv') return sweepCsv({ ...d, parameters: plan.parameters }, points);
  const cautions = hasChemicalStep(parsed.scenario.strategy) ? pesticideCautions : [];
  const { name, design, outcomes, outcomeYear, replicatesPerPoint, seed } = d;
  return `${JSON.stringify({ cautions, name: name ?? null, parameters: plan.parameters, design, outcomes, outcomeYear, replicatesPerPoint, seed, horizonYears: parsed.scenario.horizonYears, totalPoints: plan.points, points }, null, 2)}\n`;
}

async function main(argv: readonly string[]): Promise<number> {
  const args = parseArgs(argv);
  if (!args.ok) {
    process.stderr.write(`${args.message}\n`);
    return 2;
  }
  try {
    const cmd = args.value;
    const out =
      cmd.command === 'project' ? project(cmd) : cmd.command === 'analyze' ? analyze(cmd) : await sweep(cmd);
    process.stdout.write(out);
    return 0;
  } catch (error) {
    process.stderr.write(`${(error as Error).message}\n`);
    // Anything but bad input (e.g. a scenario that outgrows exact counts) is a run failure.
    return error instanceof InputError ? 2 : 1;
  }
}

process.exitCode = await main(process.argv.slice(2));
