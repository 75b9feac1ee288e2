import { useId, useRef, useState, type ChangeEvent } from 'react';
import type { UploadView } from '../../../../shared/api/records';
import { kindSpecs, recordKinds, type RecordKind } from '../../../../shared/records/columns';
import { Button, buttonClasses } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { SelectField } from '../../shared/components/SelectField';
import { templateUrl, useImport, usePreview, type UploadInput } from './api';
import { PreviewPanel } from './PreviewPanel';
import { TableScroll, tdLeft, thLeft } from './tables';

/** The treatment that is most likely the untreated check, to start the choice from. */
const guessCheck = (treatments: readonly string[]) =>
  treatments.find((t) => /untreated|check|control/i.test(t)) ?? '';

/**
 * Upload one file: choose the kind (its columns and template are shown), choose the file,
 * read the server's preview, and import it — all or nothing — once it has no problems.
 */
export function UploadForm({ workspaceId, fieldId }: { workspaceId: string; fieldId: string }) {
  const [kind, setKind] = useState<RecordKind>(recordKinds[0]);
  const [file, setFile] = useState<File | null>(null);
  const [check, setCheck] = useState('');
  const [imported, setImported] = useState<UploadView | null>(null);
  const fileRef = useRef<HTMLInputElement>(null);
  const fileId = useId();
  const fileHint = useId();
  const preview = usePreview(workspaceId, fieldId);
  const upload = useImport(workspaceId, fieldId);
  const spec = kindSpecs[kind];

  const run = (input: UploadInput) => {
    setImported(null);
    upload.reset();
    preview.mutate(input, {
      onSuccess: (report) => {
        // An efficacy file names its treatments; start the check from the likeliest one.
        if (input.kind === 'efficacy-trials' && input.check === '' && report.treatments.length > 0) {
          const guess = guessCheck(report.treatments);
          if (guess) {
            setCheck(guess);
            preview.mutate({ ...input, check: guess });
          }
        }
      },
    });
  };

  const onFile = (event: ChangeEvent<HTMLInputElement>) => {
    const chosen = event.target.files?.[0] ?? null;
    setFile(chosen);
    setCheck('');
    if (chosen) run({ file: chosen, kind, check: '' });
    else preview.reset();
  };

  const onKind = (event: ChangeEvent<HTMLSelectElement>) => {
    const next = event.target.value as RecordKind;
    setKind(next);
    if (file) run({ file, kind: next, check });
  };

  const onCheck = (event: ChangeEvent<HTMLSelectElement>) => {
    setCheck(event.target.value);
    if (file) run({ file, kind, check: event.target.value });
  };

  const doImport = () => {
    if (!file || upload.isPending) return;
    upload.mutate(
      { file, kind, check },
      {
        onSuccess: (view) => {
          setImported(view);
          setFile(null);
          setCheck('');
          preview.reset();
          if (fileRef.current) fileRef.current.value = '';
        },
      },
    );
  };

  const report = preview.data;
  const treatments = report?.kind === 'efficacy-trials' ? report.treatments : [];

  return (
    <div className="flex flex-col gap-5">
      <div className="grid gap-5 lg:grid-cols-[20rem_1fr]">
        <div className="flex flex-col gap-4">
          <SelectField
            label="Kind of records"
            name="kind"
            value={kind}
            onChange={onKind}
            options={recordKinds.map((k) => ({ value: k, label: kindSpecs[k].title }))}
            hint={spec.summary}
          />
          <a href={templateUrl(kind)} download className={`${buttonClasses('secondary', 'sm')} self-start`}>
            Download the {spec.title.toLowerCase()} template (CSV)
          </a>
          <div className="flex flex-col gap-1.5">
            <label htmlFor={fileId} className="font-medium text-humus-900">
              File
            </label>
            <p id={fileHint} className="text-sm text-loam-700">
              CSV saved as UTF-8 (from a spreadsheet: Save As → CSV UTF-8), comma-, semicolon- or
              tab-separated, at most 10 MB. Choosing a file shows a preview; nothing is saved until you
              import.
            </p>
            <input
              ref={fileRef}
              id={fileId}
              type="file"
              name="file"
              accept=".csv,.tsv,.txt,text/csv,text/plain"
              aria-describedby={fileHint}
              onChange={onFile}
              className="rounded-seed border border-loam-400 bg-white px-3 py-2 text-sm file:mr-3 file:rounded-seed file:border-0 file:bg-humus-900 file:px-3 file:py-1.5 file:text-silt-50"
            />
          </div>
          {kind === 'efficacy-trials' ? (
            treatments.length > 0 ? (
              <SelectField
                label="Untreated check"
                name="check"
                value={check}
                onChange={onCheck}
                hint="The treatment that received nothing; % control is measured against it."
                options={[
                  { value: '', label: 'Choose the untreated check' },
                  ...treatments.map((t) => ({ value: t, label: t })),
                ]}
              />
            ) : (
              <p className="text-sm text-loam-700">
                Untreated check: choose a file first; the treatments it names are offered here.
              </p>
            )
          ) : null}
        </div>
        <div className="flex min-w-0 flex-col gap-2">
          <h3 className="font-semibold">Columns of {spec.title.toLowerCase()}</h3>
          <TableScroll label={`Columns of ${spec.title}`}>
            <table className="w-full border-collapse text-sm">
              <caption className="sr-only">Columns Seedwake reads for {spec.title}</caption>
              <thead>
                <tr className="border-b-2 border-humus-900">
                  <th scope="col" className={thLeft}>
                    Header
                  </th>
                  <th scope="col" className={thLeft}>
                    Unit
                  </th>
                  <th scope="col" className={thLeft}>
                    Meaning
                  </th>
                </tr>
              </thead>
              <tbody>
                {spec.columns.map((c) => (
                  <tr key={c.key} className="border-b border-silt-200">
                    <th scope="row" className={`${tdLeft} font-normal`}>
                      {c.forms.map((f, i) => (
                        <code key={f.header} className="block font-mono text-xs">
                          {i > 0 ? 'or ' : ''}
                          {f.header}
                          {f.unitColumn ? ` + ${f.unitColumn.header}` : ''}
                        </code>
                      ))}
                    </th>
                    <td className={tdLeft}>{c.unit ?? '—'}</td>
                    <td className={`${tdLeft} text-loam-700`}>
                      <span className="font-medium text-humus-900">
                        {c.label}
                        {c.required ? '' : ' (optional)'}
                      </span>{' '}
                      — {c.description}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </TableScroll>
          <p className="text-sm text-loam-700">{spec.notes.join(' ')}</p>
        </div>
      </div>

      {preview.isPending ? <p role="status">Reading the file…</p> : null}
      <FormAlert error={preview.error} />
      {report && !preview.isPending ? (
        <div className="flex flex-col gap-4 border-t border-silt-300 pt-4">
          <PreviewPanel report={report} />
          <div className="flex flex-wrap items-center gap-3">
            <Button
              onClick={doImport}
              pending={upload.isPending}
              pendingLabel="Importing…"
              disabled={!report.importable}
            >
              Import {report.rowCount.toLocaleString('en-US')} rows
            </Button>
            {!report.importable ? (
              <span className="text-sm text-loam-700">
                Fix the problems above, then choose the file again.
              </span>
            ) : null}
          </div>
        </div>
      ) : null}
      <FormAlert error={upload.error} />
      {imported ? (
        <p
          role="status"
          className="rounded-seed border-l-4 border-sprout-600 bg-sprout-100 px-4 py-3 text-sm font-medium text-sprout-800"
        >
          Imported {imported.filename}: {imported.rowCount.toLocaleString('en-US')} rows, kept with SHA-256{' '}
          <code className="font-mono text-xs">{imported.sha256.slice(0, 16)}…</code>. The estimates below
          include it.
        </p>
      ) : null}
    </div>
  );
}
