import { and, asc, eq } from 'drizzle-orm';
import type { Executor } from '../client';
import { cardPhotos, speciesCards } from '../schema-lessons';

export type SpeciesCardRow = typeof speciesCards.$inferSelect;
/** A photo without its bytes, for lists. */
export type PhotoMeta = Omit<typeof cardPhotos.$inferSelect, 'data'>;

const photoMeta = {
  id: cardPhotos.id,
  cardId: cardPhotos.cardId,
  caption: cardPhotos.caption,
  contentType: cardPhotos.contentType,
  width: cardPhotos.width,
  height: cardPhotos.height,
  bytes: cardPhotos.bytes,
  sha256: cardPhotos.sha256,
  createdAt: cardPhotos.createdAt,
};

export async function findCard(db: Executor, workspaceId: string, profileId: string) {
  const [row] = await db
    .select()
    .from(speciesCards)
    .where(and(eq(speciesCards.workspaceId, workspaceId), eq(speciesCards.profileId, profileId)));
  return row;
}

export async function insertCard(db: Executor, row: typeof speciesCards.$inferInsert) {
  await db.insert(speciesCards).values(row);
}

export async function updateCard(db: Executor, id: string, patch: Partial<typeof speciesCards.$inferInsert>) {
  await db.update(speciesCards).set(patch).where(eq(speciesCards.id, id));
}

export async function deleteCard(db: Executor, id: string) {
  await db.delete(speciesCards).where(eq(speciesCards.id, id));
}

export function listPhotos(db: Executor, cardId: string): Promise<PhotoMeta[]> {
  return db
    .select(photoMeta)
    .from(cardPhotos)
    .where(eq(cardPhotos.cardId, cardId))
    .orderBy(asc(cardPhotos.createdAt));
}

export async function insertPhoto(db: Executor, row: typeof cardPhotos.$inferInsert) {
  await db.insert(cardPhotos).values(row);
}

export async function findPhoto(db: Executor, cardId: string, photoId: string) {
  const [row] = await db
    .select()
    .from(cardPhotos)
    .where(and(eq(cardPhotos.id, photoId), eq(cardPhotos.cardId, cardId)));
  return row;
}

export async function deletePhoto(db: Executor, cardId: string, photoId: string) {
  const [result] = await db
    .delete(cardPhotos)
    .where(and(eq(cardPhotos.id, photoId), eq(cardPhotos.cardId, cardId)));
  return result.affectedRows > 0;
}
