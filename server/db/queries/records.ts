import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Executor } from '../client';
import { recordAdoptions, recordRows, recordUploads } from '../schema-records';
import { users } from '../schema';
import { fields } from '../schema-domain';

export type UploadRow = Omit<typeof recordUploads.$inferSelect, 'data'>;
export type AdoptionRow = typeof recordAdoptions.$inferSelect;

/** Every column but the bytes, which only the download reads. */
const listed = {
  id: recordUploads.id,
  workspaceId: recordUploads.workspaceId,
  fieldId: recordUploads.fieldId,
  kind: recordUploads.kind,
  filename: recordUploads.filename,
  contentType: recordUploads.contentType,
  byteSize: recordUploads.byteSize,
  sha256: recordUploads.sha256,
  rowCount: recordUploads.rowCount,
  checkName: recordUploads.checkName,
  meta: recordUploads.meta,
  uploadedBy: recordUploads.uploadedBy,
  uploadedAt: recordUploads.uploadedAt,
};

export const listUploads = (db: Executor, fieldId: string) =>
  db
    .select(listed)
    .from(recordUploads)
    .where(eq(recordUploads.fieldId, fieldId))
    .orderBy(desc(recordUploads.uploadedAt));

export async function findUpload(db: Executor, fieldId: string, id: string) {
  const [row] = await db
    .select(listed)
    .from(recordUploads)
    .where(and(eq(recordUploads.id, id), eq(recordUploads.fieldId, fieldId)));
  return row;
}

export async function findUploadBySha(db: Executor, fieldId: string, sha256: string) {
  const [row] = await db
    .select(listed)
    .from(recordUploads)
    .where(and(eq(recordUploads.fieldId, fieldId), eq(recordUploads.sha256, sha256)));
  return row;
}

export async function readUploadBytes(db: Executor, id: string) {
  const [row] = await db
    .select({ data: recordUploads.data })
    .from(recordUploads)
    .where(eq(recordUploads.id, id));
  return row?.data;
}

/** Rows of the given uploads in file order. */
export function listRows(db: Executor, uploadIds: string[]) {
  if (uploadIds.length === 0) return Promise.resolve([]);
  return db
    .select()
    .from(recordRows)
    .where(inArray(recordRows.uploadId, uploadIds))
    .orderBy(asc(recordRows.uploadId), asc(recordRows.line));
}

/*
 * The client library sends a Buffer as a hex literal, twice its size, and MariaDB refuses a
 * statement longer than max_allowed_packet (16 MiB by default). The bytes therefore go in
 * slices appended with CONCAT, and rows in batches, each statement far below that limit.
 */
const BYTES_PER_STATEMENT = 2 * 1024 * 1024;
const ROWS_PER_STATEMENT = 1000;

export async function insertUpload(
  db: Executor,
  row: Omit<typeof recordUploads.$inferInsert, 'data'>,
  bytes: Buffer,
  rows: { line: number; data: Record<string, string | number> }[],
) {
  await db.insert(recordUploads).values({ ...row, data: bytes.subarray(0, BYTES_PER_STATEMENT) });
  for (let at = BYTES_PER_STATEMENT; at < bytes.length; at += BYTES_PER_STATEMENT) {
    const slice = bytes.subarray(at, at + BYTES_PER_STATEMENT);
    await db
      .update(recordUploads)
      .set({ data: sql`CONCAT(${recordUploads.data}, ${slice})` })
      .where(eq(recordUploads.id, row.id));
  }
  for (let at = 0; at < rows.length; at += ROWS_PER_STATEMENT) {
    await db
      .insert(recordRows)
      .values(rows.slice(at, at + ROWS_PER_STATEMENT).map((r) => ({ uploadId: row.id, ...r })));
  }
}

export async function deleteUpload(db: Executor, id: string) {
  await db.delete(recordUploads).where(eq(recordUploads.id, id));
}

export async function insertAdoption(db: Executor, row: typeof recordAdoptions.$inferInsert) {
  await db.insert(recordAdoptions).values(row);
}

export const listAdoptions = (db: Executor, fieldId: string) =>
  db
    .select()
    .from(recordAdoptions)
    .where(eq(recordAdoptions.fieldId, fieldId))
    .orderBy(desc(recordAdoptions.adoptedAt));

export const listStrategyAdoptions = (db: Executor, workspaceId: string, strategyId: string) =>
  db
    .select()
    .from(recordAdoptions)
    .where(and(eq(recordAdoptions.workspaceId, workspaceId), eq(recordAdoptions.strategyId, strategyId)))
    .orderBy(asc(recordAdoptions.adoptedAt));

/** Names of the people who uploaded or adopted, for the lists. */
export async function userNames(db: Executor, ids: (string | null)[]) {
  const wanted = [...new Set(ids.filter((i): i is string => i !== null))];
  if (wanted.length === 0) return new Map<string, string>();
  const rows = await db
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(inArray(users.id, wanted));
  return new Map(rows.map((r) => [r.id, r.name]));
}

export async function findAdoption(db: Executor, id: string) {
  const [row] = await db.select().from(recordAdoptions).where(eq(recordAdoptions.id, id));
  return row;
}

/** Holds the field's row until the transaction ends (imports into one field run one at a time). */
export async function lockField(db: Executor, fieldId: string) {
  await db.select({ id: fields.id }).from(fields).where(eq(fields.id, fieldId)).for('update');
}
