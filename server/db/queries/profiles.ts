import { and, asc, eq, isNull, or } from 'drizzle-orm';
import type { Executor } from '../client';
import { speciesProfiles } from '../schema-domain';

export type ProfileRow = typeof speciesProfiles.$inferSelect;

/** The workspace's own profiles and the built-in ones. */
export function listProfiles(db: Executor, workspaceId: string) {
  return db
    .select()
    .from(speciesProfiles)
    .where(or(eq(speciesProfiles.workspaceId, workspaceId), isNull(speciesProfiles.workspaceId)))
    .orderBy(asc(speciesProfiles.builtIn), asc(speciesProfiles.name));
}

/** A profile visible from the workspace (its own or built-in), else undefined. */
export async function findProfile(db: Executor, workspaceId: string, id: string) {
  const [row] = await db
    .select()
    .from(speciesProfiles)
    .where(
      and(
        eq(speciesProfiles.id, id),
        or(eq(speciesProfiles.workspaceId, workspaceId), isNull(speciesProfiles.workspaceId)),
      ),
    );
  return row;
}

export async function insertProfile(db: Executor, row: typeof speciesProfiles.$inferInsert) {
  await db.insert(speciesProfiles).values(row);
}

export async function updateProfile(
  db: Executor,
  id: string,
  patch: Partial<typeof speciesProfiles.$inferInsert>,
) {
  await db.update(speciesProfiles).set(patch).where(eq(speciesProfiles.id, id));
}

export async function deleteProfile(db: Executor, id: string) {
  await db.delete(speciesProfiles).where(eq(speciesProfiles.id, id));
}
