import type { PreviewReport, RecordProblem } from '../../../../shared/api/records';
import { kindSpecs } from '../../../../shared/records/columns';
import { EstimatesView } from './EstimatesView';
import { bytesText } from './format';
import { TableScroll, tdLeft, thLeft } from './tables';

/** Rows drawn in the preview: the first ones and every row with a problem. */
const SHOWN = 20;

const where = (p: RecordProblem) =>
  p.line === null
    ? p.column
      ? `Column ${p.column}`
      : 'File'
    : `Line ${p.line}${p.column ? `, ${p.column}` : ''}`;

/**
 * What the server read from a file, before anything is saved: how each column was read
 * (units converted, with the factor), the rows with each problem beside its row, the
 * file-level problems, and the estimates the file would give.
 */
export function PreviewPanel({ report }: { report: PreviewReport }) {
  const byLine = new Map<number, RecordProblem[]>();
  for (const p of report.problems) {
    if (p.line === null) continue;
    byLine.set(p.line, [...(byLine.get(p.line) ?? []), p]);
  }
  const shownLines = new Set(report.rows.map((r) => r.line));
  const fileLevel = report.problems.filter((p) => p.line === null || !shownLines.has(p.line));
  const rows = report.rows.filter((r, i) => i < SHOWN || byLine.has(r.line));
  const columns = report.columns;
  const spec = kindSpecs[report.kind];

  return (
    <section aria-label={`Preview of ${report.filename}`} className="flex flex-col gap-4">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h3 className="text-xl font-semibold">Preview: {report.filename}</h3>
        <p className="text-sm text-loam-700">
          {spec.title} · {bytesText(report.bytes)} · {report.rowCount.toLocaleString('en-US')} data rows
          {report.delimiter ? ` · ${report.delimiter}-separated` : ''} · SHA-256{' '}
          <code className="font-mono text-xs">{report.sha256.slice(0, 16)}…</code>
        </p>
      </div>
      <p
        role="status"
        className={`rounded-seed border-l-4 px-4 py-3 text-sm font-medium ${
          report.importable
            ? 'border-sprout-600 bg-sprout-100 text-sprout-800'
            : 'border-danger-700 bg-danger-50 text-danger-700'
        }`}
      >
        {report.importable
          ? `No problems found: all ${report.rowCount.toLocaleString('en-US')} rows can be imported. Nothing has been saved yet.`
          : `${report.problems.length === 1 ? '1 problem' : `${report.problems.length} problems`} found. Nothing can be saved until the file is fixed and chosen again.`}
      </p>
      {fileLevel.length > 0 ? (
        <ul className="flex flex-col gap-1 text-sm" aria-label="Problems with the file">
          {fileLevel.map((p, i) => (
            <li key={i} className="flex gap-2 text-danger-700">
              <span aria-hidden="true">✕</span>
              <span>
                <span className="font-semibold">{where(p)}:</span> {p.message}
              </span>
            </li>
          ))}
        </ul>
      ) : null}
      {report.warnings.length > 0 ? (
        <ul className="flex flex-col gap-1 text-sm text-loam-700" aria-label="Notes on the file">
          {report.warnings.map((w) => (
            <li key={w}>Note: {w}</li>
          ))}
        </ul>
      ) : null}
      {columns.length > 0 ? (
        <div className="flex flex-col gap-1">
          <h4 className="font-semibold">How the columns were read</h4>
          <ul className="flex flex-col gap-0.5 text-sm">
            {columns.map((c) => (
              <li key={c.key}>
                <code className="font-mono text-xs">{c.header}</code> → {c.label}
                {c.unit ? ` (${c.unit})` : ''}
                {c.conversion ? <span className="text-loam-700">: {c.conversion}</span> : null}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {rows.length > 0 ? (
        <TableScroll label="Parsed rows">
          <table className="w-full min-w-[44rem] border-collapse text-sm">
            <caption className="text-left text-sm text-loam-700">
              {rows.length < report.rowCount
                ? `The first rows and every row with a problem (${rows.length} of ${report.rowCount.toLocaleString('en-US')}); values in Seedwake’s units.`
                : 'Every row, with values in Seedwake’s units.'}
            </caption>
            <thead>
              <tr className="border-b-2 border-humus-900">
                <th scope="col" className={`${thLeft} w-16`}>
                  Line
                </th>
                {columns.map((c) => (
                  <th key={c.key} scope="col" className={thLeft}>
                    {c.label}
                    {c.unit ? <span className="block font-normal text-loam-700">{c.unit}</span> : null}
                  </th>
                ))}
                <th scope="col" className={thLeft}>
                  Problems
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => {
                const problems = byLine.get(r.line) ?? [];
                const bad = new Set(problems.map((p) => p.column));
                return (
                  <tr
                    key={r.line}
                    className={`border-b border-silt-200 ${problems.length ? 'bg-danger-50' : ''}`}
                    aria-invalid={problems.length ? true : undefined}
                  >
                    <th
                      scope="row"
                      className={`${tdLeft} font-mono text-xs ${problems.length ? 'border-l-4 border-danger-700 pl-2' : ''}`}
                    >
                      {r.line}
                    </th>
                    {columns.map((c) => {
                      const value = r.values[c.key];
                      const raw = r.raw[c.key] ?? '';
                      const converted =
                        c.conversion !== null && value !== null && String(value) !== raw.trim();
                      return (
                        <td
                          key={c.key}
                          className={`${tdLeft} tabular-nums ${bad.has(c.header) ? 'font-semibold text-danger-700 underline decoration-wavy' : ''}`}
                        >
                          {value === null
                            ? raw || '(empty)'
                            : typeof value === 'number'
                              ? Number(value.toPrecision(10))
                              : value}
                          {converted ? (
                            <span className="block text-xs text-loam-700">
                              file: {raw}
                              {c.fileUnit && c.fileUnit !== 'per row' ? ` ${c.fileUnit}` : ''}
                            </span>
                          ) : null}
                        </td>
                      );
                    })}
                    <td className={`${tdLeft} text-danger-700`}>
                      {problems.map((p, i) => (
                        <span key={i} className="block">
                          {p.column ? <span className="font-semibold">{p.column}: </span> : null}
                          {p.message}
                        </span>
                      ))}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </TableScroll>
      ) : null}
      {report.estimates ? (
        <div className="flex flex-col gap-3">
          <h4 className="text-lg font-semibold">What the field’s estimates would be after this import</h4>
          <EstimatesView estimates={report.estimates} kinds={[report.kind]} />
        </div>
      ) : null}
    </section>
  );
}
