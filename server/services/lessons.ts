// Lessons: editors build them from templates, members read them, and a class link lets
// anyone holding it see that one lesson — its definition, the profile parameters it runs
// on and its species card — without signing in.
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import {
  classToken,
  type ClassLessonView,
  type CreatedClassLink,
  type LessonBody,
  type LessonListItem,
  type LessonView,
  type ReplayBody,
} from '../../shared/api/lessons';
import type { SpeciesCardView } from '../../shared/api/species-cards';
import type { SpeciesProfile } from '../../models/scenario/types';
import type { Database } from '../db/client';
import { findProfile } from '../db/queries/profiles';
import {
  activeLinks,
  deleteLesson,
  findLesson,
  findLessonByLinkHash,
  insertLesson,
  insertLink,
  listLessons,
  revokeLinks,
  updateLesson,
  type LessonRow,
} from '../db/queries/lessons';
import type { ProjectionPool } from '../projections/pool';
import { requireRole } from './access';
import { notFound } from './errors';
import { renderPrompt } from './markdown';
import { runReplay } from './lesson-replays';
import type { ReplayLimiter } from './replay-limits';
import { cardOf, photoOf } from './species-cards';

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

async function linkOf(db: Database, lessonId: string) {
  const [link] = await activeLinks(db, lessonId);
  return link ? { prefix: link.prefix, createdAt: link.createdAt.toISOString() } : null;
}

async function listItem(db: Database, row: LessonRow): Promise<LessonListItem> {
  return {
    id: row.id,
    title: row.title,
    template: row.template,
    profileId: row.profileId,
    link: await linkOf(db, row.id),
    updatedAt: row.updatedAt.toISOString(),
  };
}

async function profileOf(db: Database, row: LessonRow) {
  if (!row.profileId) return null;
  const profile = await findProfile(db, row.workspaceId, row.profileId);
  if (!profile) throw notFound('Species profile');
  return profile;
}

async function toView(db: Database, row: LessonRow): Promise<LessonView> {
  const profile = await profileOf(db, row);
  return {
    ...(await listItem(db, row)),
    prompts: row.prompts.map((markdown) => ({ markdown, html: renderPrompt(markdown) })),
    definition: row.definition,
    profile: profile ? { id: profile.id, name: profile.name, profile: profile.profile } : null,
    card: profile ? await cardOf(db, row.workspaceId, profile.id) : null,
  };
}

async function existing(db: Database, workspaceId: string, id: string) {
  const row = await findLesson(db, workspaceId, id);
  if (!row) throw notFound('Lesson');
  return row;
}

/** A lesson may use the workspace's own profiles and the built-in ones. */
async function checkProfile(db: Database, workspaceId: string, profileId: string | null) {
  if (profileId && !(await findProfile(db, workspaceId, profileId))) throw notFound('Species profile');
}

export async function listLessonViews(db: Database, userId: string, workspaceId: string) {
  await requireRole(db, userId, workspaceId, 'viewer');
  return Promise.all((await listLessons(db, workspaceId)).map((row) => listItem(db, row)));
}

export async function getLesson(db: Database, userId: string, workspaceId: string, id: string) {
  await requireRole(db, userId, workspaceId, 'viewer');
  return toView(db, await existing(db, workspaceId, id));
}

export async function createLesson(db: Database, userId: string, workspaceId: string, body: LessonBody) {
  await requireRole(db, userId, workspaceId, 'editor');
  await checkProfile(db, workspaceId, body.profileId);
  const now = new Date();
  const id = randomUUID();
  await insertLesson(db, {
    id,
    workspaceId,
    title: body.title,
    template: body.definition.template,
    profileId: body.profileId,
    definition: body.definition,
    prompts: body.prompts,
    createdBy: userId,
    createdAt: now,
    updatedAt: now,
  });
  return toView(db, await existing(db, workspaceId, id));
}

export async function replaceLesson(
  db: Database,
  userId: string,
  workspaceId: string,
  id: string,
  body: LessonBody,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, id);
  await checkProfile(db, workspaceId, body.profileId);
  await updateLesson(db, id, {
    title: body.title,
    template: body.definition.template,
    profileId: body.profileId,
    definition: body.definition,
    prompts: body.prompts,
    updatedAt: new Date(),
  });
  return toView(db, await existing(db, workspaceId, id));
}

export async function removeLesson(db: Database, userId: string, workspaceId: string, id: string) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, id);
  await deleteLesson(db, id);
}

/**
 * A new class link: 32 random bytes, shown once; only its SHA-256 is kept. Any earlier
 * link of the lesson stops working, so a lesson has one live link at most.
 */
export async function createClassLink(
  db: Database,
  userId: string,
  workspaceId: string,
  lessonId: string,
): Promise<CreatedClassLink> {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, lessonId);
  const token = randomBytes(32).toString('base64url');
  const now = new Date();
  await db.transaction(async (tx) => {
    await revokeLinks(tx, lessonId, now);
    await insertLink(tx, {
      id: randomUUID(),
      lessonId,
      tokenHash: hashToken(token),
      prefix: token.slice(0, 6),
      createdBy: userId,
      createdAt: now,
    });
  });
  return { token, link: { prefix: token.slice(0, 6), createdAt: now.toISOString() } };
}

export async function revokeClassLink(db: Database, userId: string, workspaceId: string, lessonId: string) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, lessonId);
  if ((await revokeLinks(db, lessonId, new Date())) === 0) throw notFound('Class link');
}

/** The lesson behind a live class link; anything else (malformed, unknown, revoked) is not found. */
async function lessonByToken(db: Database, token: string) {
  const lesson = classToken.safeParse(token).success
    ? await findLessonByLinkHash(db, hashToken(token))
    : undefined;
  if (!lesson) throw notFound('Class link');
  return lesson;
}

/** What the class sees: this lesson alone, with no ids of the workspace's objects. */
export async function classLesson(db: Database, token: string): Promise<ClassLessonView> {
  const row = await lessonByToken(db, token);
  const profile = await profileOf(db, row);
  const card = profile ? await cardOf(db, row.workspaceId, profile.id) : null;
  return {
    title: row.title,
    prompts: row.prompts.map((markdown) => ({ html: renderPrompt(markdown) })),
    definition: row.definition,
    profile: profile ? { name: profile.name, profile: profile.profile } : null,
    card: card ? withoutProfileId(card) : null,
  };
}

const withoutProfileId = ({ profileId: _profileId, ...card }: SpeciesCardView) => card;

/** A photo of the lesson's own species card, and no other. */
export async function classPhoto(db: Database, token: string, photoId: string) {
  const row = await lessonByToken(db, token);
  if (!row.profileId) throw notFound('Photo');
  return photoOf(db, row.workspaceId, row.profileId, photoId);
}

type Replays = { pool: ProjectionPool; limiter: ReplayLimiter };

const profileParameters = async (db: Database, row: LessonRow): Promise<SpeciesProfile | null> =>
  (await profileOf(db, row))?.profile ?? null;

export async function replayLesson(
  db: Database,
  replays: Replays,
  userId: string,
  workspaceId: string,
  lessonId: string,
  ip: string,
  body: ReplayBody,
) {
  await requireRole(db, userId, workspaceId, 'viewer');
  const row = await existing(db, workspaceId, lessonId);
  const profile = await profileParameters(db, row);
  return replays.limiter.run(`user:${userId}`, ip, () =>
    runReplay(replays.pool, row.definition, profile, body),
  );
}

export async function replayClass(
  db: Database,
  replays: Replays,
  token: string,
  ip: string,
  body: ReplayBody,
) {
  const row = await lessonByToken(db, token);
  const profile = await profileParameters(db, row);
  return replays.limiter.run(`link:${hashToken(token)}`, ip, () =>
    runReplay(replays.pool, row.definition, profile, body),
  );
}
