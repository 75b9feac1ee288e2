import { kindSpecs, type ColumnSpec, type RecordKind } from './columns';

/** The header a template uses for a column: the first form, in the stored unit. */
const templateHeader = (column: ColumnSpec) => column.forms[0].header;

function columnLine(column: ColumnSpec): string {
  const unit = column.unit ? ` [${column.unit}]` : '';
  const need = column.required ? 'required' : 'optional';
  const type =
    column.type === 'count' && column.min ? `whole number ≥ ${column.min.value}` : typeName[column.type];
  return `# ${templateHeader(column)}${unit} (${need}, ${type}): ${column.description}.`;
}

const typeName: Record<ColumnSpec['type'], string> = {
  text: 'text',
  date: 'date YYYY-MM-DD',
  year: 'whole year',
  count: 'whole number ≥ 0',
  number: 'number',
  stage: 'seedling, rosette or flowering',
};

/**
 * A CSV template for one kind: a header comment (lines starting with #, which uploads skip)
 * explaining every column and its unit, an example row as a comment, and the header line.
 */
export function recordTemplate(kind: RecordKind): string {
  const spec = kindSpecs[kind];
  const headers = spec.columns.map(templateHeader);
  const example = spec.columns.map((c) => spec.example[c.key] ?? '');
  const lines = [
    `# Seedwake template: ${spec.title}`,
    `# ${spec.summary}`,
    '# Lines starting with # are comments and are skipped. Separate columns with commas (semicolons or tabs also work).',
    '# Save as CSV UTF-8. Numbers use a decimal point (a decimal comma only in semicolon- or tab-separated files).',
    ...spec.notes.map((n) => `# ${n}`),
    '# Columns:',
    ...spec.columns.map(columnLine),
    `# Example row: ${example.join(',')}`,
    headers.join(','),
  ];
  return `${lines.join('\n')}\n`;
}

export const templateFilename = (kind: RecordKind) => `seedwake-${kind}-template.csv`;
