// One uploaded file read as far as it goes: bytes → CSV table → typed rows → checks across
// rows. Nothing here touches the database; the estimators' own checks come after (they
// need the field's other uploads too).
import type { ColumnUse, RecordProblem } from '../../shared/api/records';
import type { RecordKind } from '../../shared/records/columns';
import { delimiterName, readCsv, type Delimiter } from './read-csv';
import { typeRows, type TypedFile } from './typed-rows';

export interface Inspection {
  delimiter: Delimiter | null;
  columns: ColumnUse[];
  rows: TypedFile['rows'];
  problems: RecordProblem[];
  warnings: string[];
  tags: Record<string, string>;
  treatments: string[];
}

const headerOf = (columns: readonly ColumnUse[], key: string) =>
  columns.find((c) => c.key === key)?.header ?? key;

/** The checks that need more than one cell: one field per upload, germinated within the dish, a named check. */
function acrossRows(
  kind: RecordKind,
  file: TypedFile,
  options: { fieldName: string; check: string | null },
): { problems: RecordProblem[]; warnings: string[]; treatments: string[] } {
  const problems: RecordProblem[] = [];
  const warnings: string[] = [];
  const { rows, columns } = file;
  if (kind === 'seedbank-samples' || kind === 'plant-counts') {
    const first = rows.find((r) => typeof r.values.field === 'string');
    const named = first?.values.field as string | undefined;
    for (const r of rows) {
      if (typeof r.values.field === 'string' && r.values.field !== named) {
        problems.push({
          line: r.line,
          column: headerOf(columns, 'field'),
          message: `names field “${r.values.field}” but line ${first?.line} names “${named}”; one upload holds the records of one field`,
        });
      }
    }
    if (named !== undefined && named.toLowerCase() !== options.fieldName.trim().toLowerCase()) {
      warnings.push(`The file names the field “${named}”; it will be filed under “${options.fieldName}”.`);
    }
  }
  if (kind === 'germination-tests') {
    for (const r of rows) {
      const { germinated, seeds } = r.values;
      if (typeof germinated === 'number' && typeof seeds === 'number' && germinated > seeds) {
        problems.push({
          line: r.line,
          column: headerOf(columns, 'germinated'),
          message: `${germinated} germinated is more than the ${seeds} seeds in the dish`,
        });
      }
    }
  }
  const treatments =
    kind === 'efficacy-trials'
      ? [
          ...new Set(
            rows.flatMap((r) => (typeof r.values.treatment === 'string' ? [r.values.treatment] : [])),
          ),
        ]
      : [];
  if (kind === 'efficacy-trials' && file.problems.length === 0) {
    const check = options.check?.trim() ?? '';
    if (check === '') {
      problems.push({
        line: null,
        column: null,
        message: `Name the untreated check in the upload form, exactly as in the treatment column (treatments: ${treatments.join(', ')}).`,
      });
    } else if (!treatments.includes(check)) {
      problems.push({
        line: null,
        column: headerOf(columns, 'treatment'),
        message: `The untreated check “${check}” is not in the treatment column (treatments: ${treatments.join(', ')}).`,
      });
    }
  }
  return { problems, warnings, treatments };
}

export function inspectFile(
  kind: RecordKind,
  bytes: Buffer,
  options: { fieldName: string; check: string | null },
): Inspection {
  const read = readCsv(bytes);
  if (!read.ok) {
    return {
      delimiter: null,
      columns: [],
      rows: [],
      problems: read.problems,
      warnings: [],
      tags: {},
      treatments: [],
    };
  }
  const file = typeRows(kind, read.table);
  const across = acrossRows(kind, file, options);
  const warnings = [...file.warnings, ...across.warnings];
  if (read.table.delimiter !== ',') {
    warnings.unshift(
      `Columns are separated by ${delimiterName(read.table.delimiter)}, so a decimal comma (2,5) is read as 2.5.`,
    );
  }
  return {
    delimiter: read.table.delimiter,
    columns: file.columns,
    rows: file.rows,
    problems: [...file.problems, ...across.problems].sort((a, b) => (a.line ?? 0) - (b.line ?? 0)),
    warnings,
    tags: file.tags,
    treatments: across.treatments,
  };
}
