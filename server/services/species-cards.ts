// Species cards: how to tell a weed from its look-alikes, its life form and status as the
// person entered them, and photos. A card belongs to a workspace and describes a profile
// visible from it (its own or a built-in one).
import { createHash, randomUUID } from 'node:crypto';
import type { SpeciesCardBody, SpeciesCardView } from '../../shared/api/species-cards';
import type { Database } from '../db/client';
import { findProfile } from '../db/queries/profiles';
import {
  deleteCard,
  deletePhoto,
  findCard,
  findPhoto,
  insertCard,
  insertPhoto,
  listPhotos,
  updateCard,
  type PhotoMeta,
  type SpeciesCardRow,
} from '../db/queries/species-cards';
import { requireRole } from './access';
import { conflict, notFound } from './errors';
import { processPhoto } from './photos';

export const MAX_PHOTOS_PER_CARD = 8;

const toPhotoView = (p: PhotoMeta) => ({
  id: p.id,
  caption: p.caption,
  contentType: p.contentType,
  width: p.width,
  height: p.height,
  bytes: p.bytes,
  sha256: p.sha256,
});

export async function toCardView(db: Database, card: SpeciesCardRow): Promise<SpeciesCardView> {
  return {
    profileId: card.profileId,
    identificationNotes: card.identificationNotes,
    lookAlikes: card.lookAlikes,
    lifeForm: card.lifeForm,
    status: card.status,
    photos: (await listPhotos(db, card.id)).map(toPhotoView),
    updatedAt: card.updatedAt.toISOString(),
  };
}

/** The card of a profile in a workspace, or null; no role check (callers have made theirs). */
export async function cardOf(db: Database, workspaceId: string, profileId: string) {
  const card = await findCard(db, workspaceId, profileId);
  return card ? toCardView(db, card) : null;
}

async function visibleProfile(db: Database, workspaceId: string, profileId: string) {
  if (!(await findProfile(db, workspaceId, profileId))) throw notFound('Species profile');
}

async function existingCard(db: Database, workspaceId: string, profileId: string) {
  const card = await findCard(db, workspaceId, profileId);
  if (!card) throw notFound('Species card');
  return card;
}

export async function getCard(db: Database, userId: string, workspaceId: string, profileId: string) {
  await requireRole(db, userId, workspaceId, 'viewer');
  await visibleProfile(db, workspaceId, profileId);
  return toCardView(db, await existingCard(db, workspaceId, profileId));
}

/** Creates the card or replaces its text; photos are added and removed on their own. */
export async function putCard(
  db: Database,
  userId: string,
  workspaceId: string,
  profileId: string,
  body: SpeciesCardBody,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  await visibleProfile(db, workspaceId, profileId);
  const now = new Date();
  const existing = await findCard(db, workspaceId, profileId);
  if (existing) await updateCard(db, existing.id, { ...body, updatedAt: now });
  else
    await insertCard(db, {
      id: randomUUID(),
      workspaceId,
      profileId,
      ...body,
      createdAt: now,
      updatedAt: now,
    });
  return toCardView(db, (await findCard(db, workspaceId, profileId))!);
}

export async function removeCard(db: Database, userId: string, workspaceId: string, profileId: string) {
  await requireRole(db, userId, workspaceId, 'editor');
  await visibleProfile(db, workspaceId, profileId);
  await deleteCard(db, (await existingCard(db, workspaceId, profileId)).id);
}

export async function addPhoto(
  db: Database,
  userId: string,
  workspaceId: string,
  profileId: string,
  upload: { bytes: Buffer; caption: string },
) {
  await requireRole(db, userId, workspaceId, 'editor');
  await visibleProfile(db, workspaceId, profileId);
  const card = await existingCard(db, workspaceId, profileId);
  if ((await listPhotos(db, card.id)).length >= MAX_PHOTOS_PER_CARD)
    throw conflict(`A card holds at most ${MAX_PHOTOS_PER_CARD} photos; remove one first`);
  const photo = await processPhoto(upload.bytes);
  const id = randomUUID();
  await insertPhoto(db, {
    id,
    cardId: card.id,
    caption: upload.caption,
    contentType: photo.contentType,
    width: photo.width,
    height: photo.height,
    bytes: photo.data.length,
    sha256: photo.sha256,
    data: photo.data,
    createdAt: new Date(),
  });
  await updateCard(db, card.id, { updatedAt: new Date() });
  return toCardView(db, card);
}

/** A stored photo's bytes for the card of (workspace, profile); no role check. */
export async function photoOf(db: Database, workspaceId: string, profileId: string, photoId: string) {
  const card = await findCard(db, workspaceId, profileId);
  const photo = card ? await findPhoto(db, card.id, photoId) : undefined;
  if (!photo) throw notFound('Photo');
  // The checksum taken at upload guards against bytes damaged in storage being served.
  if (createHash('sha256').update(photo.data).digest('hex') !== photo.sha256)
    throw new Error(`photo ${photo.id} does not match its stored SHA-256`);
  return photo;
}

export async function readPhoto(
  db: Database,
  userId: string,
  workspaceId: string,
  profileId: string,
  photoId: string,
) {
  await requireRole(db, userId, workspaceId, 'viewer');
  return photoOf(db, workspaceId, profileId, photoId);
}

export async function removePhoto(
  db: Database,
  userId: string,
  workspaceId: string,
  profileId: string,
  photoId: string,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  const card = await existingCard(db, workspaceId, profileId);
  if (!(await deletePhoto(db, card.id, photoId))) throw notFound('Photo');
}
