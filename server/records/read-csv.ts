import { CsvError, parse } from 'csv-parse/sync';
import type { RecordProblem } from '../../shared/api/records';

export type Delimiter = ',' | ';' | '\t';

export interface CsvTable {
  delimiter: Delimiter;
  /** 1-based line of the header in the file. */
  headerLine: number;
  headers: string[];
  /** Data records with the file line each one ends on (what a spreadsheet shows as the row). */
  records: { line: number; cells: string[] }[];
}

export type CsvRead = { ok: true; table: CsvTable } | { ok: false; problems: RecordProblem[] };

const fileProblem = (message: string, line: number | null = null): CsvRead => ({
  ok: false,
  problems: [{ line, column: null, message }],
});

const delimiterNames: Record<Delimiter, string> = { ',': 'commas', ';': 'semicolons', '\t': 'tabs' };
export const delimiterName = (d: Delimiter) => delimiterNames[d];

/** Line (1-based) holding byte `offset`. */
function lineAt(bytes: Buffer, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset; i++) if (bytes[i] === 0x0a) line++;
  return line;
}

/**
 * Text out of the uploaded bytes, or why they are not CSV text. Spreadsheets save CSV as
 * UTF-8 (Excel's "CSV UTF-8" adds a byte-order mark, which is dropped); a workbook saved
 * under a .csv name, UTF-16 text or an 8-bit code page would otherwise be misread as
 * garbled columns, so each gets its own message.
 */
function decode(bytes: Buffer): { ok: true; text: string } | { ok: false; read: CsvRead } {
  if (bytes.length === 0) return { ok: false, read: fileProblem('The file is empty.') };
  if (bytes[0] === 0x50 && bytes[1] === 0x4b && bytes[2] === 0x03 && bytes[3] === 0x04) {
    return {
      ok: false,
      read: fileProblem(
        'This is a zipped file such as an Excel workbook (.xlsx), not CSV text. In the spreadsheet choose Save As → “CSV UTF-8 (comma delimited)” and upload that file.',
      ),
    };
  }
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    return {
      ok: false,
      read: fileProblem(
        'The file is saved as UTF-16 (“Unicode text”). Save it as “CSV UTF-8” and upload it again.',
      ),
    };
  }
  const nul = bytes.indexOf(0);
  if (nul >= 0) {
    return {
      ok: false,
      read: fileProblem(
        `The file contains NUL bytes (first at byte ${nul + 1}), so it is a binary file, not CSV text — perhaps a workbook or another file renamed .csv. Export it from the spreadsheet as “CSV UTF-8”.`,
        lineAt(bytes, nul),
      ),
    };
  }
  try {
    const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    return { ok: true, text: text.charCodeAt(0) === 0xfeff ? text.slice(1) : text };
  } catch {
    const bad = firstInvalidUtf8(bytes);
    return {
      ok: false,
      read: fileProblem(
        `The file is not UTF-8 text (byte ${bad + 1} is not valid UTF-8; older spreadsheets save in a code page such as Windows-1252). Save it as “CSV UTF-8” and upload it again.`,
        lineAt(bytes, bad),
      ),
    };
  }
}

/** Offset of the first byte that breaks UTF-8 (RFC 3629 §4), for the message. */
function firstInvalidUtf8(bytes: Buffer): number {
  for (let i = 0; i < bytes.length;) {
    const b = bytes[i];
    const extra =
      b < 0x80
        ? 0
        : b >= 0xc2 && b <= 0xdf
          ? 1
          : b >= 0xe0 && b <= 0xef
            ? 2
            : b >= 0xf0 && b <= 0xf4
              ? 3
              : -1;
    if (extra < 0) return i;
    for (let k = 1; k <= extra; k++) {
      const c = bytes[i + k];
      if (c === undefined || (c & 0xc0) !== 0x80) return i;
    }
    i += extra + 1;
  }
  return 0;
}

const isComment = (line: string) => line.trimStart().startsWith('#');

/** Counts each candidate delimiter outside double quotes. */
function countOutsideQuotes(line: string): Record<Delimiter, number> {
  const counts: Record<Delimiter, number> = { ',': 0, ';': 0, '\t': 0 };
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === ',' || ch === ';' || ch === '\t')) counts[ch]++;
  }
  return counts;
}

/**
 * The delimiter is the one of comma, semicolon and tab that the header line uses most
 * (a tie goes to the comma). A header with none of them is reported with what it seems to
 * use instead, since every later row would otherwise be one long column.
 */
function detectDelimiter(
  header: string,
  line: number,
): { ok: true; delimiter: Delimiter } | { ok: false; read: CsvRead } {
  const counts = countOutsideQuotes(header);
  const best = (Object.keys(counts) as Delimiter[]).reduce((a, b) => (counts[b] > counts[a] ? b : a), ',');
  if (counts[best] > 0) return { ok: true, delimiter: best };
  const other = header.match(/[|:^~]/)?.[0] ?? (/\S\s+\S/.test(header.trim()) ? 'spaces' : null);
  const seen =
    other === null ? '' : other === 'spaces' ? ' It seems to use spaces.' : ` It seems to use “${other}”.`;
  return {
    ok: false,
    read: fileProblem(
      `The header line “${header.slice(0, 120)}” has no comma, semicolon or tab between its columns.${seen} Save the file as CSV with commas, semicolons or tabs as the separator.`,
      line,
    ),
  };
}

const csvMessages: Record<string, string> = {
  CSV_QUOTE_NOT_CLOSED: 'a double quote opened here is never closed',
  CSV_INVALID_CLOSING_QUOTE:
    'a closing double quote is followed by other characters; put quotes around the whole value',
  CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE: 'characters follow a closing double quote',
};

/**
 * Reads an uploaded CSV with csv-parse: comment lines (# at the start of a line) and empty
 * lines are skipped, every row keeps the file line it ends on, and rows whose number of
 * values differs from the header are kept for the caller to report row by row.
 */
export function readCsv(bytes: Buffer): CsvRead {
  const decoded = decode(bytes);
  if (!decoded.ok) return decoded.read;
  const { text } = decoded;
  const lines = text.split(/\r\n|\n|\r/);
  const headerIndex = lines.findIndex((l) => l.trim() !== '' && !isComment(l));
  if (headerIndex < 0) return fileProblem('The file has no header line: every line is empty or a # comment.');
  const detected = detectDelimiter(lines[headerIndex], headerIndex + 1);
  if (!detected.ok) return detected.read;
  const { delimiter } = detected;

  let parsed: { record: string[]; info: { lines: number } }[];
  try {
    parsed = parse(text, {
      delimiter,
      comment: '#',
      comment_no_infix: true,
      relax_column_count: true,
      skip_empty_lines: true,
      info: true,
    }) as unknown as { record: string[]; info: { lines: number } }[];
  } catch (error) {
    if (error instanceof CsvError) {
      const at = (error as CsvError & { lines?: number }).lines ?? null;
      return fileProblem(
        `The file could not be read as CSV: ${csvMessages[error.code] ?? error.message}.`,
        at,
      );
    }
    throw error;
  }
  const [header, ...rest] = parsed;
  return {
    ok: true,
    table: {
      delimiter,
      headerLine: header.info.lines,
      headers: header.record.map((h) => h.trim()),
      // A row of empty cells (a spreadsheet's blank row saved with its separators) is no record.
      records: rest
        .filter((r) => r.record.some((cell) => cell.trim() !== ''))
        .map((r) => ({ line: r.info.lines, cells: r.record })),
    },
  };
}
