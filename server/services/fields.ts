import { randomUUID } from 'node:crypto';
import type { FieldBody, FieldView } from '../../shared/api/fields';
import type { Database } from '../db/client';
import {
  deleteField,
  findField,
  insertField,
  listFields,
  updateField,
  type FieldRow,
} from '../db/queries/fields';
import { requireRole } from './access';
import { conflict, notFound } from './errors';
import { isReferenced } from './references';
import { canSee, visibilityFor } from './visibility';

export const toFieldView = (r: FieldRow): FieldView => ({
  id: r.id,
  name: r.name,
  crop: r.crop,
  plantingYear: r.plantingYear,
  notes: r.notes,
  setting: r.setting,
  updatedAt: r.updatedAt.toISOString(),
});

async function existing(db: Database, workspaceId: string, id: string) {
  const row = await findField(db, workspaceId, id);
  if (!row) throw notFound('Field');
  return row;
}

export async function listFieldViews(db: Database, userId: string, workspaceId: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  const v = await visibilityFor(db, workspaceId, userId, role);
  return (await listFields(db, workspaceId)).filter((f) => canSee(v, 'fieldIds', f.id)).map(toFieldView);
}

export async function getField(db: Database, userId: string, workspaceId: string, id: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  if (!canSee(await visibilityFor(db, workspaceId, userId, role), 'fieldIds', id)) throw notFound('Field');
  return toFieldView(await existing(db, workspaceId, id));
}

export async function createField(db: Database, userId: string, workspaceId: string, body: FieldBody) {
  await requireRole(db, userId, workspaceId, 'editor');
  const now = new Date();
  const id = randomUUID();
  await insertField(db, {
    id,
    workspaceId,
    name: body.setting.name,
    crop: body.crop,
    plantingYear: body.plantingYear,
    notes: body.notes,
    setting: body.setting,
    createdAt: now,
    updatedAt: now,
  });
  return toFieldView(await existing(db, workspaceId, id));
}

export async function replaceField(
  db: Database,
  userId: string,
  workspaceId: string,
  id: string,
  body: FieldBody,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, id);
  await updateField(db, id, {
    name: body.setting.name,
    crop: body.crop,
    plantingYear: body.plantingYear,
    notes: body.notes,
    setting: body.setting,
    updatedAt: new Date(),
  });
  return toFieldView(await existing(db, workspaceId, id));
}

export async function removeField(db: Database, userId: string, workspaceId: string, id: string) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, id);
  if (await isReferenced(db, workspaceId, { fieldId: id }))
    throw conflict('A scenario uses this field; change or delete that scenario first');
  await deleteField(db, id);
}
