// Field records: preview, all-or-nothing import, the stored originals and the estimates.
// Every call goes through `recordsField`, which applies the one role rule and hides fields
// a viewer has not been shown.
import { createHash, randomUUID } from 'node:crypto';
import type { PreviewReport, RecordProblem, UploadFields, UploadView } from '../../shared/api/records';
import type { RecordKind } from '../../shared/records/columns';
import type { Role } from '../../shared/api/auth';
import type { Database, Executor } from '../db/client';
import { findField, type FieldRow } from '../db/queries/fields';
import {
  deleteUpload,
  findUpload,
  findUploadBySha,
  insertUpload,
  listRows,
  lockField,
  listUploads,
  readUploadBytes,
  userNames,
  type UploadRow,
} from '../db/queries/records';
import { fieldEstimates, problemsFor, type StoredUpload } from '../records/estimates';
import { inspectFile } from '../records/inspect';
import { delimiterName } from '../records/read-csv';
import { requireRole } from './access';
import { conflict, invalid, notFound, type AppError } from './errors';
import { canSee, visibilityFor } from './visibility';

/** Uploads above this are refused with 413 before they are read into memory in full. */
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;
/** A preview shows this many rows (and every row with a problem); the import takes them all. */
const PREVIEW_ROWS = 500;

export interface UploadedFile {
  bytes: Buffer;
  filename: string;
  contentType: string;
}

export const recordsPath = (workspaceId: string, fieldId: string) =>
  `/w/${workspaceId}/fields/${fieldId}/records`;

/** The field, once the caller may act on it with `role`; viewers see only fields shared with them. */
export async function recordsField(
  db: Database,
  userId: string,
  workspaceId: string,
  fieldId: string,
  role: Role,
) {
  const membership = await requireRole(db, userId, workspaceId, role);
  if (!canSee(await visibilityFor(db, workspaceId, userId, membership.role), 'fieldIds', fieldId))
    throw notFound('Field');
  const field = await findField(db, workspaceId, fieldId);
  if (!field) throw notFound('Field');
  return field;
}

/** The file name as shown and stored: no folders, no control characters, at most 200 characters. */
export function cleanFilename(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  // eslint-disable-next-line no-control-regex
  const clean = base.replace(/[\u0000-\u001f\u007f]/g, '').trim();
  if (clean === '') return 'upload.csv';
  if (clean.length <= 200) return clean;
  const dot = clean.lastIndexOf('.');
  const ext = dot > 0 && clean.length - dot <= 10 ? clean.slice(dot) : '';
  return clean.slice(0, 200 - ext.length) + ext;
}

/** Every stored upload of the field (optionally one kind), with its rows, for the estimators. */
export async function storedUploads(
  db: Executor,
  fieldId: string,
  kind?: RecordKind,
): Promise<StoredUpload[]> {
  const uploads = (await listUploads(db, fieldId)).filter((u) => !kind || u.kind === kind).reverse();
  const rows = await listRows(
    db,
    uploads.map((u) => u.id),
  );
  return uploads.map((u) => ({
    id: u.id,
    filename: u.filename,
    sha256: u.sha256,
    kind: u.kind,
    check: u.checkName,
    tags: u.meta.tags,
    rows: rows.filter((r) => r.uploadId === u.id).map((r) => ({ line: r.line, values: r.data })),
  }));
}

interface Prepared {
  report: PreviewReport;
  upload: StoredUpload;
  delimiter: string;
  /** An upload of the same bytes already in the field. */
  duplicate: UploadRow | undefined;
}

/**
 * Reads and checks a file as the import would, against the field's other uploads of the
 * same kind (soil cores and plant counts are pooled), without writing anything.
 */
async function prepare(
  db: Executor,
  field: FieldRow,
  file: UploadedFile,
  fields: UploadFields,
): Promise<Prepared> {
  const sha256 = createHash('sha256').update(file.bytes).digest('hex');
  const check = fields.check?.trim() || null;
  const inspection = inspectFile(fields.kind, file.bytes, { fieldName: field.name, check });
  const upload: StoredUpload = {
    id: randomUUID(),
    filename: cleanFilename(file.filename),
    sha256,
    kind: fields.kind,
    check,
    tags: inspection.tags,
    rows: inspection.rows.map((r) => ({ line: r.line, values: r.values })),
  };
  const problems: RecordProblem[] = [...inspection.problems];
  const warnings = [...inspection.warnings];
  const duplicate = await findUploadBySha(db, field.id, sha256);
  if (duplicate) {
    problems.unshift({
      line: null,
      column: null,
      message: `This exact file (same SHA-256) was already imported into this field as ${duplicate.filename} on ${duplicate.uploadedAt.toISOString().slice(0, 10)}; importing it again would count its rows twice.`,
    });
  }
  let estimates: PreviewReport['estimates'] = null;
  if (problems.length === 0) {
    const others = await storedUploads(db, field.id, fields.kind);
    const result = fieldEstimates(field.id, [...others, upload], recordsPath(field.workspaceId, field.id));
    problems.push(...problemsFor(upload, result.issues, others));
    // A germination test or a trial is one experiment: the preview shows this file's alone.
    if (problems.length === 0) {
      estimates = {
        ...result.estimates,
        germination: result.estimates.germination.filter((g) => g.upload.uploadId === upload.id),
        efficacy: result.estimates.efficacy.filter((e) => e.upload.uploadId === upload.id),
      };
    }
  }
  const flagged = new Set(problems.map((p) => p.line));
  const shown = inspection.rows.filter((r, i) => i < PREVIEW_ROWS || flagged.has(r.line));
  const report: PreviewReport = {
    kind: fields.kind,
    filename: upload.filename,
    sha256,
    bytes: file.bytes.length,
    delimiter:
      inspection.delimiter === null
        ? null
        : ({ ',': 'comma', ';': 'semicolon', '\t': 'tab' } as const)[inspection.delimiter],
    columns: inspection.columns,
    rowCount: inspection.rows.length,
    rows: shown.map((r) => ({
      line: r.line,
      raw: r.raw,
      values: Object.fromEntries(Object.keys(r.raw).map((k) => [k, r.values[k] ?? null])),
    })),
    problems,
    warnings,
    treatments: inspection.treatments,
    estimates,
    importable: problems.length === 0,
  };
  return {
    report,
    upload,
    duplicate,
    delimiter: inspection.delimiter === null ? '' : delimiterName(inspection.delimiter),
  };
}

export async function previewRecords(
  db: Database,
  userId: string,
  workspaceId: string,
  fieldId: string,
  file: UploadedFile,
  fields: UploadFields,
) {
  const field = await recordsField(db, userId, workspaceId, fieldId, 'editor');
  return (await prepare(db, field, file, fields)).report;
}

/** A 400 whose `fields` name each problem by line and column, and whose message says nothing was saved. */
function rejected(problems: readonly RecordProblem[]): AppError {
  const fields: Record<string, string> = {};
  for (const p of problems) {
    let key =
      p.line === null
        ? p.column
          ? `file ${p.column}`
          : 'file'
        : `line ${p.line}${p.column ? ` ${p.column}` : ''}`;
    for (let n = 2; key in fields; n++) key = `${key.replace(/ #\d+$/, '')} #${n}`;
    fields[key] = p.message;
  }
  const first = problems[0];
  const where = first.line === null ? '' : `line ${first.line}${first.column ? `, ${first.column}` : ''}: `;
  const count = problems.length === 1 ? 'a problem' : `${problems.length} problems`;
  return invalid(`The file has ${count}, so nothing was saved. ${where}${first.message}`, fields);
}

/**
 * Imports a file all or nothing: any problem refuses the whole file, and the upload with its
 * bytes and every row is written in one transaction, so a failure half-way leaves no trace.
 */
export async function storeRecords(
  db: Database,
  field: FieldRow,
  userId: string | null,
  file: UploadedFile,
  fields: UploadFields,
  now = new Date(),
) {
  const prepared = await prepare(db, field, file, fields);
  const { report, upload } = prepared;
  if (prepared.duplicate) throw conflict(report.problems[0].message);
  if (!report.importable) throw rejected(report.problems);
  await db.transaction(async (tx) => {
    // Imports into one field take turns, so two sends of the same file cannot both pass the check.
    await lockField(tx, field.id);
    const raced = await findUploadBySha(tx, field.id, upload.sha256);
    if (raced)
      throw conflict(`This exact file (same SHA-256) was just imported into this field as ${raced.filename}`);
    await insertUpload(
      tx,
      {
        id: upload.id,
        workspaceId: field.workspaceId,
        fieldId: field.id,
        kind: upload.kind,
        filename: upload.filename,
        contentType: file.contentType.slice(0, 100) || 'text/csv',
        byteSize: file.bytes.length,
        sha256: upload.sha256,
        rowCount: upload.rows.length,
        checkName: upload.check,
        meta: { delimiter: prepared.delimiter, tags: upload.tags },
        uploadedBy: userId,
        uploadedAt: now,
      },
      file.bytes,
      upload.rows.map((r) => ({ line: r.line, data: r.values })),
    );
  });
  return upload.id;
}

function toUploadView(u: UploadRow, names: Map<string, string>): UploadView {
  return {
    id: u.id,
    kind: u.kind,
    filename: u.filename,
    contentType: u.contentType,
    bytes: u.byteSize,
    sha256: u.sha256,
    rowCount: u.rowCount,
    check: u.checkName,
    uploadedBy: u.uploadedBy ? (names.get(u.uploadedBy) ?? null) : null,
    uploadedAt: u.uploadedAt.toISOString(),
  };
}

async function uploadView(db: Database, fieldId: string, id: string) {
  const row = await findUpload(db, fieldId, id);
  if (!row) throw notFound('Upload');
  return toUploadView(row, await userNames(db, [row.uploadedBy]));
}

export async function importRecords(
  db: Database,
  userId: string,
  workspaceId: string,
  fieldId: string,
  file: UploadedFile,
  fields: UploadFields,
) {
  const field = await recordsField(db, userId, workspaceId, fieldId, 'editor');
  const id = await storeRecords(db, field, userId, file, fields);
  return uploadView(db, fieldId, id);
}

export async function listUploadViews(db: Database, userId: string, workspaceId: string, fieldId: string) {
  await recordsField(db, userId, workspaceId, fieldId, 'viewer');
  const rows = await listUploads(db, fieldId);
  const names = await userNames(
    db,
    rows.map((r) => r.uploadedBy),
  );
  return rows.map((r) => toUploadView(r, names));
}

/** The original bytes exactly as uploaded, with their checksum. */
export async function uploadOriginal(
  db: Database,
  userId: string,
  workspaceId: string,
  fieldId: string,
  uploadId: string,
) {
  await recordsField(db, userId, workspaceId, fieldId, 'viewer');
  const row = await findUpload(db, fieldId, uploadId);
  const bytes = row ? await readUploadBytes(db, uploadId) : undefined;
  if (!row || !bytes) throw notFound('Upload');
  return { filename: row.filename, contentType: row.contentType, sha256: row.sha256, bytes };
}

export async function removeUpload(
  db: Database,
  userId: string,
  workspaceId: string,
  fieldId: string,
  uploadId: string,
) {
  await recordsField(db, userId, workspaceId, fieldId, 'editor');
  if (!(await findUpload(db, fieldId, uploadId))) throw notFound('Upload');
  await deleteUpload(db, uploadId);
}

export async function getFieldEstimates(db: Database, userId: string, workspaceId: string, fieldId: string) {
  await recordsField(db, userId, workspaceId, fieldId, 'viewer');
  return fieldEstimates(fieldId, await storedUploads(db, fieldId), recordsPath(workspaceId, fieldId))
    .estimates;
}
