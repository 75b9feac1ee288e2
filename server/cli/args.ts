// Command-line arguments of the sim CLI, parsed by hand so every mistake gets a message
// that names the offending argument (and so the CLI needs no extra package).

export type CliCommand =
  | {
      command: 'project';
      file: string;
      seed?: number;
      replicates?: number;
      years?: number;
      format: 'json' | 'csv';
    }
  | { command: 'analyze'; file: string }
  | { command: 'sweep'; file: string; workers: number; format: 'json' | 'csv' };

export type ArgsResult = { ok: true; value: CliCommand } | { ok: false; message: string };

export const usage = [
  'usage: sim project <scenario.json> [--seed N] [--replicates N] [--years N] [--format json|csv]',
  '       sim analyze <matrix.json>',
  '       sim sweep <sweep.json> [--workers N] [--format csv|json]',
].join('\n');

const fail = (message: string): ArgsResult => ({ ok: false, message: `${message}\n${usage}` });

const INTEGER = /^-?\d+$/;

export function parseArgs(argv: readonly string[]): ArgsResult {
  const [command, ...rest] = argv;
  if (command === undefined) return fail('missing command (project, analyze or sweep)');
  if (command !== 'project' && command !== 'analyze' && command !== 'sweep')
    return fail(`unknown command "${command}" (project, analyze or sweep)`);
  const positional: string[] = [];
  const flags = new Map<string, string>();
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i];
    if (!arg.startsWith('--')) {
      positional.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const name = eq === -1 ? arg.slice(2) : arg.slice(2, eq);
    const value: string | undefined = eq === -1 ? rest[i + 1] : arg.slice(eq + 1);
    if (eq === -1) i++;
    if (value === undefined || value === '') return fail(`--${name} needs a value`);
    if (flags.has(name)) return fail(`--${name} is given twice`);
    flags.set(name, value);
  }
  if (positional.length === 0) return fail(`${command} needs a file name`);
  if (positional.length > 1)
    return fail(`${command} takes one file, got ${positional.length}: ${positional.join(' ')}`);
  const file = positional[0];
  if (command === 'analyze') {
    const first = flags.keys().next();
    if (!first.done) return fail(`analyze takes no options, got --${first.value}`);
    return { ok: true, value: { command, file } };
  }
  if (command === 'sweep') {
    const sweep: CliCommand = { command, file, workers: 1, format: 'json' };
    for (const [name, value] of flags) {
      if (name === 'format') {
        if (value !== 'json' && value !== 'csv') return fail(`--format must be json or csv, got "${value}"`);
        sweep.format = value;
      } else if (name === 'workers') {
        if (!INTEGER.test(value) || Number(value) < 1 || Number(value) > 64)
          return fail(`--workers must be a whole number from 1 to 64, got "${value}"`);
        sweep.workers = Number(value);
      } else {
        return fail(`unknown option --${name}`);
      }
    }
    return { ok: true, value: sweep };
  }
  const out: CliCommand = { command, file, format: 'json' };
  for (const [name, value] of flags) {
    if (name === 'format') {
      if (value !== 'json' && value !== 'csv') return fail(`--format must be json or csv, got "${value}"`);
      out.format = value;
    } else if (name === 'seed' || name === 'replicates' || name === 'years') {
      // Whole numbers only; ranges are checked by the scenario schema, which knows them.
      if (!INTEGER.test(value)) return fail(`--${name} must be a whole number, got "${value}"`);
      out[name] = Number(value);
    } else {
      return fail(`unknown option --${name}`);
    }
  }
  return { ok: true, value: out };
}
