// Sweep results as tidy CSV (one row per point × outcome, the parameter values as columns
// with their units in the headers), ASCII and RFC 4180 quoting so R and spreadsheets read
// it as is. The server's download and the command line write the same text.
import { pointSeed } from '../../models/sensitivity/point-seed';
import { outcomeInfo, type OutcomeKind } from './outcomes';

export interface CsvPoint {
  index: number;
  inputs: readonly number[];
  outcomes: Partial<Record<OutcomeKind, number>> | null;
  error: string | null;
}

export interface CsvDefinition {
  parameters: readonly { path: string; unit: string }[];
  outcomes: readonly OutcomeKind[];
  outcomeYear: number;
  seed: number;
}

const asciiUnit = (unit: string) => unit.replace(/²/g, '2');

function field(value: string | number | null): string {
  if (value === null) return '';
  const text = typeof value === 'number' ? (Number.isFinite(value) ? String(value) : '') : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function sweepCsv(definition: CsvDefinition, points: readonly CsvPoint[]): string {
  const header = [
    'point',
    'point_seed',
    ...definition.parameters.map((p) => `${p.path} (${asciiUnit(p.unit)})`),
    'outcome',
    'year',
    'value',
    'unit',
    'error',
  ];
  const lines = [header.map(field).join(',')];
  for (const point of points) {
    const seed = pointSeed(definition.seed, point.index);
    for (const kind of definition.outcomes) {
      const info = outcomeInfo[kind];
      lines.push(
        [
          point.index,
          seed,
          ...point.inputs,
          kind,
          info.atYear ? definition.outcomeYear : null,
          point.outcomes?.[kind] ?? null,
          asciiUnit(info.unit),
          point.error,
        ]
          .map(field)
          .join(','),
      );
    }
  }
  return `${lines.join('\r\n')}\r\n`;
}
