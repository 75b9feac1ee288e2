import { and, desc, eq } from 'drizzle-orm';
import type { Executor } from '../client';
import { lessonLinks, lessons } from '../schema-lessons';

export type LessonRow = typeof lessons.$inferSelect;
export type LessonLinkRow = typeof lessonLinks.$inferSelect;

export function listLessons(db: Executor, workspaceId: string) {
  return db
    .select()
    .from(lessons)
    .where(eq(lessons.workspaceId, workspaceId))
    .orderBy(desc(lessons.updatedAt));
}

export async function findLesson(db: Executor, workspaceId: string, id: string) {
  const [row] = await db
    .select()
    .from(lessons)
    .where(and(eq(lessons.id, id), eq(lessons.workspaceId, workspaceId)));
  return row;
}

export async function insertLesson(db: Executor, row: typeof lessons.$inferInsert) {
  await db.insert(lessons).values(row);
}

export async function updateLesson(db: Executor, id: string, patch: Partial<typeof lessons.$inferInsert>) {
  await db.update(lessons).set(patch).where(eq(lessons.id, id));
}

export async function deleteLesson(db: Executor, id: string) {
  await db.delete(lessons).where(eq(lessons.id, id));
}

export async function lessonUsingProfile(db: Executor, profileId: string) {
  const [row] = await db
    .select({ id: lessons.id })
    .from(lessons)
    .where(eq(lessons.profileId, profileId))
    .limit(1);
  return row;
}

/** The links of a lesson that still work (there is at most one). */
export function activeLinks(db: Executor, lessonId: string) {
  return db
    .select()
    .from(lessonLinks)
    .where(and(eq(lessonLinks.lessonId, lessonId), eq(lessonLinks.revoked, false)));
}

export async function insertLink(db: Executor, row: typeof lessonLinks.$inferInsert) {
  await db.insert(lessonLinks).values(row);
}

export async function revokeLinks(db: Executor, lessonId: string, at: Date) {
  const [result] = await db
    .update(lessonLinks)
    .set({ revoked: true, revokedAt: at })
    .where(and(eq(lessonLinks.lessonId, lessonId), eq(lessonLinks.revoked, false)));
  return result.affectedRows;
}

/** The lesson behind a link that still works. */
export async function findLessonByLinkHash(db: Executor, tokenHash: string) {
  const [row] = await db
    .select({ lesson: lessons })
    .from(lessonLinks)
    .innerJoin(lessons, eq(lessons.id, lessonLinks.lessonId))
    .where(and(eq(lessonLinks.tokenHash, tokenHash), eq(lessonLinks.revoked, false)));
  return row?.lesson;
}
