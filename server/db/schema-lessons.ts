// Teaching: lessons built from templates, their class links, and species cards with
// photos. A class link's secret is never stored: only its SHA-256 (the secret has 256
// random bits, so a slow password hash adds nothing, as for API tokens).
import {
  boolean,
  char,
  customType,
  datetime,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  text,
  uniqueIndex,
  varchar,
} from 'drizzle-orm/mysql-core';
import type { LessonDefinition } from '../../shared/api/lessons';
import type { LookAlikeRow } from '../../shared/api/species-cards';
import { lessonTemplates } from '../../shared/lessons/templates';
import { jsonColumn } from './json-column';
import { speciesProfiles } from './schema-domain';
import { users, workspaces } from './schema';

const id = (name = 'id') => char(name, { length: 36 });
const workspaceRef = () =>
  id('workspace_id')
    .notNull()
    .references(() => workspaces.id, { onDelete: 'cascade' });

/** Image bytes kept in the database, so backups and workspace deletion cover photos too. */
const longblob = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'longblob' });

export const lessons = mysqlTable(
  'lessons',
  {
    id: id().primaryKey(),
    workspaceId: workspaceRef(),
    title: varchar('title', { length: 120 }).notNull(),
    template: mysqlEnum('template', lessonTemplates).notNull(),
    profileId: id('profile_id').references(() => speciesProfiles.id, { onDelete: 'restrict' }),
    /** The template and the slider ranges and starting values the teacher fixed. */
    definition: jsonColumn<LessonDefinition>('definition').notNull(),
    /** Markdown as the teacher wrote it; rendered and sanitised whenever it is served. */
    prompts: jsonColumn<string[]>('prompts').notNull(),
    createdBy: id('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
    updatedAt: datetime('updated_at', { fsp: 3 }).notNull(),
  },
  (t) => [index('lessons_workspace').on(t.workspaceId, t.updatedAt)],
);

export const lessonLinks = mysqlTable(
  'lesson_links',
  {
    id: id().primaryKey(),
    lessonId: id('lesson_id')
      .notNull()
      .references(() => lessons.id, { onDelete: 'cascade' }),
    tokenHash: char('token_hash', { length: 64 }).notNull().unique(),
    /** The first characters of the token, so a teacher can tell links apart. */
    prefix: varchar('prefix', { length: 12 }).notNull(),
    revoked: boolean('revoked').notNull().default(false),
    createdBy: id('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
    revokedAt: datetime('revoked_at', { fsp: 3 }),
  },
  (t) => [index('lesson_links_lesson').on(t.lessonId, t.revoked)],
);

/** One card per profile and workspace: built-in profiles are shared, each workspace writes its own card. */
export const speciesCards = mysqlTable(
  'species_cards',
  {
    id: id().primaryKey(),
    workspaceId: workspaceRef(),
    profileId: id('profile_id')
      .notNull()
      .references(() => speciesProfiles.id, { onDelete: 'cascade' }),
    identificationNotes: text('identification_notes').notNull(),
    lookAlikes: jsonColumn<LookAlikeRow[]>('look_alikes').notNull(),
    lifeForm: varchar('life_form', { length: 120 }).notNull(),
    status: varchar('status', { length: 200 }).notNull(),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
    updatedAt: datetime('updated_at', { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex('species_cards_profile').on(t.workspaceId, t.profileId)],
);

export const cardPhotos = mysqlTable(
  'card_photos',
  {
    id: id().primaryKey(),
    cardId: id('card_id')
      .notNull()
      .references(() => speciesCards.id, { onDelete: 'cascade' }),
    caption: varchar('caption', { length: 200 }).notNull(),
    contentType: mysqlEnum('content_type', ['image/jpeg', 'image/png']).notNull(),
    width: int('width').notNull(),
    height: int('height').notNull(),
    bytes: int('bytes').notNull(),
    /** SHA-256 of `data`, checked when the photo is served. */
    sha256: char('sha256', { length: 64 }).notNull(),
    data: longblob('data').notNull(),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
  },
  (t) => [index('card_photos_card').on(t.cardId, t.createdAt)],
);
