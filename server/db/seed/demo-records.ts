// The demo field's records: the invented files in models/examples/records/, imported through
// the same checks as an upload, so the Hollow Lane block opens with estimates to adopt.
import { readFileSync } from 'node:fs';
import type { Database } from '../client';
import type { UploadFields } from '../../../shared/api/records';
import { findField } from '../queries/fields';
import { findUploadBySha } from '../queries/records';
import { storeRecords } from '../../services/records';
import { createHash } from 'node:crypto';
import { demoFields } from './demo-library';
import { demoPeople, demoWorkspace } from './demo-people';

const folder = new URL('../../../models/examples/records/', import.meta.url);

/** Oldest first, as they would have been uploaded. */
const demoRecordFiles: { file: string; fields: UploadFields }[] = [
  { file: 'hollow-lane-soil-cores-2023-2025.csv', fields: { kind: 'seedbank-samples' } },
  { file: 'hollow-lane-quadrats.csv', fields: { kind: 'plant-counts' } },
  { file: 'germination-test.csv', fields: { kind: 'germination-tests' } },
  { file: 'hollow-lane-efficacy-trial.csv', fields: { kind: 'efficacy-trials', check: 'untreated check' } },
  { file: 'hollow-lane-soil-cores.csv', fields: { kind: 'seedbank-samples' } },
];

/** Imports each demo file into the Hollow Lane block unless it is there; returns how many it added. */
export async function seedFieldRecords(db: Database, now: Date): Promise<number> {
  const field = await findField(db, demoWorkspace.id, demoFields[0].id);
  if (!field) return 0;
  const consultant = demoPeople.find((p) => p.email.startsWith('consultant@'))!;
  let added = 0;
  for (const [i, { file, fields }] of demoRecordFiles.entries()) {
    const bytes = readFileSync(new URL(file, folder));
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    if (await findUploadBySha(db, field.id, sha256)) continue;
    const at = new Date(now.getTime() - (demoRecordFiles.length - i) * 60_000);
    await storeRecords(
      db,
      field,
      consultant.id,
      { bytes, filename: file, contentType: 'text/csv' },
      fields,
      at,
    );
    added++;
  }
  return added;
}
