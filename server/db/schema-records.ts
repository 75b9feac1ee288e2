// Field records: the original uploaded files (bytes, checksum, who and when), their parsed
// rows, and every adoption of an estimate into a profile, a strategy step or a field.
//
// Rows are kept as JSON documents keyed to the upload and its file line, not in one table
// per kind: the four kinds have different columns, rows are only ever read back whole (per
// field and kind) to recompute estimates, never filtered by a column, and the column spec in
// shared/records/columns.ts already validates every value on import. One rows table keeps an
// all-or-nothing import to one transaction over two tables, and a new kind needs no migration.
import {
  char,
  customType,
  datetime,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  text,
  varchar,
} from 'drizzle-orm/mysql-core';
import { recordKinds } from '../../shared/records/columns';
import type { SourceRef } from '../../shared/api/records';
import { jsonColumn } from './json-column';
import { fields, speciesProfiles, strategies } from './schema-domain';
import { users, workspaces } from './schema';

const id = (name = 'id') => char(name, { length: 36 });

/** The original file, byte for byte, kept in the database so backups and field deletion cover it. */
const longblob = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'longblob' });

export const recordUploads = mysqlTable(
  'record_uploads',
  {
    id: id().primaryKey(),
    workspaceId: id('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    fieldId: id('field_id')
      .notNull()
      .references(() => fields.id, { onDelete: 'cascade' }),
    kind: mysqlEnum('kind', recordKinds).notNull(),
    filename: varchar('filename', { length: 255 }).notNull(),
    contentType: varchar('content_type', { length: 100 }).notNull(),
    byteSize: int('byte_size').notNull(),
    /** SHA-256 of the bytes, hex; the same file twice in one field is refused. */
    sha256: char('sha256', { length: 64 }).notNull(),
    data: longblob('data').notNull(),
    rowCount: int('row_count').notNull(),
    /** Efficacy trials: the untreated check named in the upload form. */
    checkName: varchar('check_name', { length: 200 }),
    /** Which header form each column used (e.g. count: seedlings-emerged), and the delimiter. */
    meta: jsonColumn<{ delimiter: string; tags: Record<string, string> }>('meta').notNull(),
    uploadedBy: id('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    uploadedAt: datetime('uploaded_at', { fsp: 3 }).notNull(),
  },
  (t) => [
    index('record_uploads_field').on(t.fieldId, t.kind, t.uploadedAt),
    index('record_uploads_sha').on(t.fieldId, t.sha256),
  ],
);

export const recordRows = mysqlTable(
  'record_rows',
  {
    uploadId: id('upload_id')
      .notNull()
      .references(() => recordUploads.id, { onDelete: 'cascade' }),
    /** The row's line in the original file, so messages and the file agree. */
    line: int('line').notNull(),
    /** Values in the stored units, by column key (see shared/records/columns.ts). */
    data: jsonColumn<Record<string, string | number>>('data').notNull(),
  },
  (t) => [primaryKey({ columns: [t.uploadId, t.line] })],
);

export const adoptionTargets = ['profile', 'step', 'field-seedbank'] as const;

export const recordAdoptions = mysqlTable(
  'record_adoptions',
  {
    id: id().primaryKey(),
    workspaceId: id('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    fieldId: id('field_id')
      .notNull()
      .references(() => fields.id, { onDelete: 'cascade' }),
    estimateKey: text('estimate_key').notNull(),
    estimateLabel: varchar('estimate_label', { length: 300 }).notNull(),
    targetKind: mysqlEnum('target_kind', adoptionTargets).notNull(),
    profileId: id('profile_id').references(() => speciesProfiles.id, { onDelete: 'cascade' }),
    strategyId: id('strategy_id').references(() => strategies.id, { onDelete: 'cascade' }),
    /** The step a strategy adoption changed, and its label then (to tell whether the note still applies). */
    stepIndex: int('step_index'),
    stepLabel: varchar('step_label', { length: 200 }),
    targetName: varchar('target_name', { length: 200 }).notNull(),
    /** "seedDecay.shallow", "steps[1].efficacy" or "initialSeedbank". */
    path: varchar('path', { length: 120 }).notNull(),
    previous: jsonColumn<unknown>('previous').notNull(),
    value: jsonColumn<unknown>('value').notNull(),
    note: text('note').notNull(),
    sources: jsonColumn<SourceRef[]>('sources').notNull(),
    adoptedBy: id('adopted_by').references(() => users.id, { onDelete: 'set null' }),
    adoptedAt: datetime('adopted_at', { fsp: 3 }).notNull(),
  },
  (t) => [
    index('record_adoptions_field').on(t.fieldId, t.adoptedAt),
    index('record_adoptions_strategy').on(t.strategyId),
  ],
);
