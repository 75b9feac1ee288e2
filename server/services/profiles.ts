import { randomUUID } from 'node:crypto';
import type { ProfileBody, ProfileView } from '../../shared/api/profiles';
import type { Database } from '../db/client';
import {
  deleteProfile,
  findProfile,
  insertProfile,
  listProfiles,
  updateProfile,
  type ProfileRow,
} from '../db/queries/profiles';
import { requireRole } from './access';
import { conflict, forbidden, notFound } from './errors';
import { isReferenced } from './references';
import { lessonUsingProfile } from '../db/queries/lessons';
import { canSee, visibilityFor } from './visibility';

export const toProfileView = (r: ProfileRow): ProfileView => ({
  id: r.id,
  name: r.name,
  builtIn: r.builtIn,
  profile: r.profile,
  sources: r.sources,
  copiedFrom: r.copiedFrom,
  updatedAt: r.updatedAt.toISOString(),
});

async function visible(db: Database, workspaceId: string, id: string) {
  const row = await findProfile(db, workspaceId, id);
  if (!row) throw notFound('Species profile');
  return row;
}

export async function listProfileViews(db: Database, userId: string, workspaceId: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  const v = await visibilityFor(db, workspaceId, userId, role);
  return (await listProfiles(db, workspaceId))
    .filter((p) => p.builtIn || canSee(v, 'profileIds', p.id))
    .map(toProfileView);
}

export async function getProfile(db: Database, userId: string, workspaceId: string, id: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  const row = await visible(db, workspaceId, id);
  if (!row.builtIn && !canSee(await visibilityFor(db, workspaceId, userId, role), 'profileIds', id))
    throw notFound('Species profile');
  return toProfileView(row);
}

export async function createProfile(
  db: Database,
  userId: string,
  workspaceId: string,
  body: ProfileBody,
  copiedFrom: string | null = null,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  const now = new Date();
  const id = randomUUID();
  await insertProfile(db, {
    id,
    workspaceId,
    name: body.profile.name,
    builtIn: false,
    profile: body.profile,
    sources: body.sources,
    copiedFrom,
    createdAt: now,
    updatedAt: now,
  });
  return toProfileView((await findProfile(db, workspaceId, id))!);
}

/** Built-in profiles are illustrative and shared by all workspaces: copy one to change it. */
export async function copyProfile(db: Database, userId: string, workspaceId: string, id: string) {
  const source = await visible(db, workspaceId, id);
  const name = source.builtIn
    ? source.profile.name.replace(/\s*\(illustrative\)\s*$/i, '')
    : source.profile.name;
  return createProfile(
    db,
    userId,
    workspaceId,
    { profile: { ...source.profile, name: `${name} (copy)` }, sources: source.sources },
    source.id,
  );
}

async function editable(db: Database, userId: string, workspaceId: string, id: string) {
  await requireRole(db, userId, workspaceId, 'editor');
  const row = await visible(db, workspaceId, id);
  if (row.builtIn) throw forbidden('Built-in profiles are read-only; copy it to make your own version');
  return row;
}

export async function replaceProfile(
  db: Database,
  userId: string,
  workspaceId: string,
  id: string,
  body: ProfileBody,
) {
  await editable(db, userId, workspaceId, id);
  await updateProfile(db, id, {
    name: body.profile.name,
    profile: body.profile,
    sources: body.sources,
    updatedAt: new Date(),
  });
  return toProfileView((await findProfile(db, workspaceId, id))!);
}

export async function removeProfile(db: Database, userId: string, workspaceId: string, id: string) {
  await editable(db, userId, workspaceId, id);
  if (await isReferenced(db, workspaceId, { profileId: id }))
    throw conflict('A scenario uses this profile; change or delete that scenario first');
  if (await lessonUsingProfile(db, id))
    throw conflict('A lesson uses this profile; change or delete that lesson first');
  await deleteProfile(db, id);
}
