// Argument parsing of the sim CLI, against the usage documented in issue 3.
import { describe, expect, it } from 'vitest';
import { parseArgs } from '../../../../server/cli/args';

describe('sim arguments', () => {
  it('reads project with every option, in either --flag value or --flag=value form', () => {
    expect(
      parseArgs(['project', 'a.json', '--seed', '7', '--replicates=20', '--years', '5', '--format', 'csv']),
    ).toEqual({
      ok: true,
      value: { command: 'project', file: 'a.json', seed: 7, replicates: 20, years: 5, format: 'csv' },
    });
    expect(parseArgs(['analyze', 'm.json'])).toEqual({
      ok: true,
      value: { command: 'analyze', file: 'm.json' },
    });
  });

  it('names what is wrong', () => {
    const message = (argv: string[]) => {
      const r = parseArgs(argv);
      return r.ok ? '' : r.message.split('\n')[0];
    };
    expect(message([])).toBe('missing command (project, analyze or sweep)');
    expect(message(['run', 'a.json'])).toBe('unknown command "run" (project, analyze or sweep)');
    expect(message(['project'])).toBe('project needs a file name');
    expect(message(['project', 'a.json', 'b.json'])).toBe('project takes one file, got 2: a.json b.json');
    expect(message(['project', 'a.json', '--seed'])).toBe('--seed needs a value');
    expect(message(['project', 'a.json', '--seed', '1.5'])).toBe('--seed must be a whole number, got "1.5"');
    expect(message(['project', 'a.json', '--seed', '1', '--seed', '2'])).toBe('--seed is given twice');
    expect(message(['project', 'a.json', '--colour', 'red'])).toBe('unknown option --colour');
    expect(message(['analyze', 'm.json', '--years', '3'])).toBe('analyze takes no options, got --years');
  });
});
