import { downloadBlob } from './download';

export type CsvCell = string | number | null | undefined;

/**
 * One CSV field as RFC 4180 §2 writes it: quoted when it holds a comma, quote or line
 * break, with inner quotes doubled. Numbers are written in full (no thousands separators,
 * no rounding beyond what the caller chose) so R and spreadsheets read them as numbers.
 * Empty for a missing value.
 */
export function csvField(value: CsvCell): string {
  if (value === null || value === undefined) return '';
  const text = typeof value === 'number' ? (Number.isFinite(value) ? String(value) : '') : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Header and rows as CSV text with CRLF line ends (RFC 4180 §2.1). */
export function toCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  return [header, ...rows].map((row) => row.map(csvField).join(',')).join('\r\n') + '\r\n';
}

/**
 * Downloads a table as UTF-8 CSV. No byte-order mark: R's read.csv would fold it into the
 * first column's name, and tidy CSV for scripts matters more here than spreadsheet guessing.
 */
export function downloadCsv(
  filename: string,
  header: readonly string[],
  rows: readonly (readonly CsvCell[])[],
) {
  const blob = new Blob([toCsv(header, rows)], { type: 'text/csv;charset=utf-8' });
  downloadBlob(blob, filename.endsWith('.csv') ? filename : `${filename}.csv`);
}
