import {
  kindSpecs,
  normaliseHeader,
  stageNames,
  type ColumnSpec,
  type HeaderForm,
  type RecordKind,
  type UnitForm,
} from '../../shared/records/columns';
import type { ColumnUse, RecordProblem } from '../../shared/api/records';
import type { CsvTable } from './read-csv';

export type CellValue = string | number;

/** One data row in the stored units, by column key; `line` is its line in the file. */
export interface TypedRow {
  line: number;
  values: Record<string, CellValue>;
}

export interface TypedFile {
  columns: ColumnUse[];
  /** Rows that were read; values that could not be read are left out of `values`. */
  rows: (TypedRow & { raw: Record<string, string> })[];
  problems: RecordProblem[];
  warnings: string[];
  /** Tags of the header forms used, by column key (e.g. count → "seedlings-emerged"). */
  tags: Record<string, string>;
}

interface Placed {
  column: ColumnSpec;
  form: HeaderForm;
  index: number;
  header: string;
  unitIndex: number | null;
}

const namesOf = (form: HeaderForm) => [form.header, ...(form.aliases ?? [])];

/** Which file column holds which spec column; every missing, doubled or unknown header is reported. */
function placeColumns(kind: RecordKind, table: CsvTable) {
  const problems: RecordProblem[] = [];
  const warnings: string[] = [];
  const normalised = table.headers.map(normaliseHeader);
  const used = new Set<number>();
  const placed: Placed[] = [];
  const headerProblem = (message: string, column: string | null = null) =>
    problems.push({ line: table.headerLine, column, message });

  for (const column of kindSpecs[kind].columns) {
    const found = column.forms.flatMap((form) =>
      normalised.flatMap((h, index) => (namesOf(form).includes(h) ? [{ form, index }] : [])),
    );
    if (found.length === 0) {
      if (column.required) {
        const names = column.forms.map((f) => f.header).join(' or ');
        headerProblem(
          `Missing column ${names} (${column.label.toLowerCase()}${column.unit ? `, ${column.unit}` : ''}): ${column.description}.`,
          column.forms[0].header,
        );
      }
      continue;
    }
    if (found.length > 1) {
      headerProblem(
        `Columns ${found.map((f) => `“${table.headers[f.index]}”`).join(' and ')} both give the ${column.label.toLowerCase()}; keep one of them.`,
        table.headers[found[1].index],
      );
      continue;
    }
    const [{ form, index }] = found;
    used.add(index);
    let unitIndex: number | null = null;
    if (form.unitColumn) {
      unitIndex = normalised.indexOf(form.unitColumn.header);
      if (unitIndex < 0) {
        headerProblem(
          `Column “${table.headers[index]}” needs a ${form.unitColumn.header} column saying the unit of each row (${Object.keys(form.unitColumn.units).join(', ')}), or write the unit in the header (e.g. ${column.forms
            .map((f) => f.header)
            .filter((h) => h !== form.header)
            .join(' or ')}).`,
          form.unitColumn.header,
        );
        continue;
      }
      used.add(unitIndex);
    }
    placed.push({ column, form, index, header: table.headers[index], unitIndex });
  }
  normalised.forEach((h, index) => {
    if (used.has(index)) return;
    if (h === '') headerProblem(`Header cell ${index + 1} is empty; name the column or remove it.`);
    else if (normalised.indexOf(h) !== index)
      headerProblem(`Column “${table.headers[index]}” appears twice.`, table.headers[index]);
    else
      warnings.push(
        `Column “${table.headers[index]}” is not one Seedwake reads for ${kindSpecs[kind].title.toLowerCase()}; it was ignored.`,
      );
  });
  return { placed, problems, warnings };
}

/** A number as written in a spreadsheet cell; a decimal comma only where commas do not separate columns. */
function readNumber(text: string, decimalComma: boolean): number | null {
  const t = text.trim();
  const normal = decimalComma && /^[+-]?\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(normal)) return null;
  const n = Number(normal);
  return Number.isFinite(n) ? n : null;
}

type Read = { ok: true; value: CellValue } | { ok: false; message: string };

function readCell(column: ColumnSpec, text: string, unit: UnitForm | undefined, decimalComma: boolean): Read {
  const t = text.trim();
  if (t === '') return { ok: false, message: `is empty; ${column.label.toLowerCase()} is required` };
  const quoted = `“${t.length > 40 ? `${t.slice(0, 40)}…` : t}”`;
  switch (column.type) {
    case 'text':
      return t.length > 200
        ? { ok: false, message: 'is longer than 200 characters' }
        : { ok: true, value: t };
    case 'date': {
      const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(t);
      const date = m ? new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]))) : null;
      if (!m || !date || date.getUTCMonth() !== Number(m[2]) - 1 || date.getUTCDate() !== Number(m[3])) {
        return {
          ok: false,
          message: `${quoted} is not a date written YYYY-MM-DD (ISO 8601), e.g. 2026-03-10`,
        };
      }
      return { ok: true, value: t };
    }
    case 'year': {
      const n = readNumber(t, false);
      if (n === null || !Number.isInteger(n) || n < 1900 || n > 2100) {
        return { ok: false, message: `${quoted} is not a year from 1900 to 2100` };
      }
      return { ok: true, value: n };
    }
    case 'stage': {
      const s = t.toLowerCase().replace(/s$/, '');
      return (stageNames as readonly string[]).includes(s)
        ? { ok: true, value: s }
        : { ok: false, message: `${quoted} is not a stage; write seedling, rosette or flowering` };
    }
    case 'count': {
      const n = readNumber(t, decimalComma);
      if (n === null)
        return {
          ok: false,
          message: `${quoted} is not a number; ${column.label.toLowerCase()} is a whole number`,
        };
      if (n < 0) return { ok: false, message: `must not be negative, got ${n}` };
      if (!Number.isInteger(n)) return { ok: false, message: `must be a whole number, got ${n}` };
      if (column.min && n < column.min.value)
        return { ok: false, message: `must be at least ${column.min.value}, got ${n}` };
      return { ok: true, value: n };
    }
    case 'number': {
      const n = readNumber(t, decimalComma);
      if (n === null) return { ok: false, message: `${quoted} is not a number` };
      const value = unit ? unit.toBase(n) : n;
      const min = column.min;
      if (min && (min.inclusive ? n < min.value : n <= min.value)) {
        return {
          ok: false,
          message:
            min.value === 0 && min.inclusive
              ? `must not be negative, got ${n}`
              : `must be ${min.inclusive ? 'at least' : 'greater than'} ${min.value}, got ${n}`,
        };
      }
      return { ok: true, value };
    }
  }
}

/**
 * Reads every row against the kind's columns: each cell is typed and converted to the
 * stored unit, and every cell that cannot be read becomes a problem naming the line and
 * the column as written in the header — all of them, so one pass fixes the file.
 */
export function typeRows(kind: RecordKind, table: CsvTable): TypedFile {
  const { placed, problems, warnings } = placeColumns(kind, table);
  const columns: ColumnUse[] = placed.map((p) => ({
    key: p.column.key,
    label: p.column.label,
    header: p.header,
    unit: p.column.unit,
    fileUnit: p.form.unitColumn ? 'per row' : (p.form.unit?.unit ?? p.column.unit),
    conversion: p.form.unitColumn
      ? `unit per row from the ${p.form.unitColumn.header} column; ${Object.values(p.form.unitColumn.units)
          .map((u) => u.rule)
          .filter((r, i, all) => r !== null && all.indexOf(r) === i)
          .join('; ')}`
      : (p.form.unit?.rule ?? null),
  }));
  const tags = Object.fromEntries(placed.flatMap((p) => (p.form.tag ? [[p.column.key, p.form.tag]] : [])));
  if (problems.length > 0) return { columns, rows: [], problems, warnings, tags };

  const width = table.headers.length;
  const decimalComma = table.delimiter !== ',';
  const rows: TypedFile['rows'] = [];
  for (const record of table.records) {
    const cells = record.cells;
    const extra = cells.slice(width);
    if (cells.length < width || extra.some((c) => c.trim() !== '')) {
      problems.push({
        line: record.line,
        column: null,
        message: `has ${cells.length} values but the header has ${width} columns; check this row uses the same separator as the header and quotes any value containing one`,
      });
      continue;
    }
    const values: Record<string, CellValue> = {};
    const raw: Record<string, string> = {};
    for (const p of placed) {
      const text = cells[p.index];
      raw[p.column.key] = text;
      let unit = p.form.unit;
      if (p.form.unitColumn && p.unitIndex !== null) {
        const written = cells[p.unitIndex].trim();
        unit = p.form.unitColumn.units[normaliseHeader(written)];
        raw[p.column.key] = `${text} ${written}`.trim();
        if (!unit) {
          problems.push({
            line: record.line,
            column: table.headers[p.unitIndex],
            message: `“${written}” is not a unit for ${p.header}; write ${Object.keys(p.form.unitColumn.units).join(', ')}`,
          });
          continue;
        }
      }
      const read = readCell(p.column, text, unit, decimalComma);
      if (read.ok) values[p.column.key] = read.value;
      else problems.push({ line: record.line, column: p.header, message: read.message });
    }
    rows.push({ line: record.line, values, raw });
  }
  if (table.records.length === 0) {
    problems.push({ line: null, column: null, message: 'The file has a header but no data rows.' });
  }
  return { columns, rows, problems, warnings, tags };
}
