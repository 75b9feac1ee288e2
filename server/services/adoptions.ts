// Adopting an estimate: into a species profile parameter (its `sources` map gets the note),
// a strategy step's efficacy, or a field's initial seedbank, with one row in the adoption log.
//
// Where a step's note lives: steps are engine input validated by a strict schema and have no
// sources map, and a label is the step's name in every chart and table (at most 200
// characters). So a step's source notes are kept in the adoption log, keyed like
// "steps[1].efficacy", and served by GET …/strategies/:id/sources. A note stays current while
// the step at that index keeps its label and the adopted efficacy; after an edit it is shown
// as superseded rather than silently attached to a different step.
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import type { AdoptBody, Adoptable, AdoptionView, FieldEstimates } from '../../shared/api/records';
import { parameterCatalogue } from '../../shared/scenario/parameters';
import { fieldSchema, profileSchema, strategySchema } from '../../shared/scenario/schema';
import { formatPath } from '../../shared/scenario/parse';
import type { SpeciesProfile, Step } from '../../models/scenario/types';
import type { Database, Executor } from '../db/client';
import { findField, updateField, type FieldRow } from '../db/queries/fields';
import { findProfile, updateProfile } from '../db/queries/profiles';
import { findStrategy, updateStrategy } from '../db/queries/strategies';
import {
  findAdoption,
  insertAdoption,
  listAdoptions,
  listStrategyAdoptions,
  userNames,
  type AdoptionRow,
} from '../db/queries/records';
import { fieldEstimates } from '../records/estimates';
import { adoptedNote, AGE_CLASS as AGE, seedbankFromLayers } from '../../shared/records/adopt-notes';
import { requireRole } from './access';
import { forbidden, invalid, notFound } from './errors';
import { recordsField, recordsPath, storedUploads } from './records';
import { canSee, visibilityFor } from './visibility';

/** Every adoptable estimate of the field, by key. */
function adoptables(estimates: FieldEstimates): Map<string, Adoptable> {
  const all: Adoptable[] = [
    ...estimates.seedbank.years.map((y) => y.adopt),
    ...estimates.seedbank.decay.flatMap((d) => (d.adopt ? [d.adopt] : [])),
    ...estimates.plants.transitions.flatMap((t) => (t.adopt ? [t.adopt] : [])),
    ...estimates.germination.flatMap((g) => g.temperatures.map((t) => t.adopt)),
    ...estimates.efficacy.flatMap((e) => e.timings.flatMap((t) => t.treatments.map((x) => x.adopt))),
  ];
  return new Map(all.map((a) => [a.key, a]));
}

/** The profile's `sources` key of a parameter: the germination-by-age list shares one note. */
const sourceKey = (parameter: string) => (AGE.test(parameter) ? 'germination.shallowByAge' : parameter);

function parameterLabel(parameter: string): string {
  const age = AGE.exec(parameter);
  if (age) return `${parameterCatalogue['profile.germination.shallowByAge[]'].label} (age class ${age[1]})`;
  const entry = (parameterCatalogue as Record<string, { label: string }>)[`profile.${parameter}`];
  return entry?.label ?? parameter;
}

function readParameter(profile: SpeciesProfile, parameter: string): number | undefined {
  const age = AGE.exec(parameter);
  if (age) {
    const list = profile.germination.shallowByAge;
    return list[Math.min(Number(age[1]), list.length - 1)];
  }
  const [a, b] = parameter.split('.');
  const top = (profile as unknown as Record<string, unknown>)[a];
  const value = b === undefined ? top : (top as Record<string, unknown> | undefined)?.[b];
  return typeof value === 'number' ? value : undefined;
}

/** A copy of the profile with the parameter set; an age class past the list's end repeats its last value up to it. */
function writeParameter(profile: SpeciesProfile, parameter: string, value: number): SpeciesProfile {
  const next = structuredClone(profile);
  const age = AGE.exec(parameter);
  if (age) {
    const i = Number(age[1]);
    const list = next.germination.shallowByAge;
    while (list.length <= i) list.push(list[list.length - 1]);
    list[i] = value;
    return next;
  }
  const [a, b] = parameter.split('.');
  const record = next as unknown as Record<string, Record<string, number> | number>;
  if (b === undefined) record[a] = value;
  else (record[a] as Record<string, number>)[b] = value;
  return next;
}

/** A schema failure of the changed object as a 400 naming the changed parameter. */
function refuseInvalid(error: z.ZodError, root: string): never {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) fields[formatPath(issue.path, root)] ??= issue.message;
  const [path, message] = Object.entries(fields)[0];
  throw invalid(`Adopting this estimate would make ${path} invalid: ${message}`, fields);
}

type Applied = Omit<
  Parameters<typeof insertAdoption>[1],
  'id' | 'workspaceId' | 'fieldId' | 'estimateKey' | 'estimateLabel' | 'sources' | 'adoptedBy' | 'adoptedAt'
>;

async function intoProfile(
  db: Executor,
  workspaceId: string,
  estimate: Adoptable,
  target: Extract<AdoptBody['target'], { kind: 'profile' }>,
): Promise<Applied> {
  const row = await findProfile(db, workspaceId, target.profileId);
  if (!row) throw notFound('Species profile');
  if (row.builtIn) {
    throw forbidden(
      `“${row.name}” is a built-in profile and read-only; copy it first (Copy to edit on the profile page) and adopt the estimate into your copy`,
    );
  }
  const allowed = estimate.parameters.some(
    (p) => p === target.parameter || (AGE.test(p) && AGE.test(target.parameter)),
  );
  if (!allowed || estimate.fraction === null) {
    throw invalid(
      `${estimate.label} cannot go into ${parameterLabel(target.parameter)}; it fits ${estimate.parameters.map(parameterLabel).join(' or ')}`,
      {
        'target.parameter': `Choose ${estimate.parameters.map(parameterLabel).join(' or ')}`,
      },
    );
  }
  const age = AGE.exec(target.parameter);
  if (age && Number(age[1]) >= row.profile.ageClasses) {
    throw invalid(
      `The profile has ${row.profile.ageClasses} age classes (0 to ${row.profile.ageClasses - 1})`,
      {
        'target.parameter': `Choose an age class from 0 to ${row.profile.ageClasses - 1}`,
      },
    );
  }
  const value = estimate.fraction;
  const profile = writeParameter(row.profile, target.parameter, value);
  const checked = profileSchema.safeParse(profile);
  if (!checked.success) refuseInvalid(checked.error, 'profile');
  const note = adoptedNote(estimate, target, { shallow: 0, deep: 0 });
  await updateProfile(db, row.id, {
    profile: checked.data,
    sources: { ...row.sources, [sourceKey(target.parameter)]: note },
    updatedAt: new Date(),
  });
  return {
    targetKind: 'profile',
    profileId: row.id,
    targetName: row.name,
    path: target.parameter,
    previous: readParameter(row.profile, target.parameter) ?? null,
    value,
    note,
  };
}

async function intoStep(
  db: Executor,
  workspaceId: string,
  estimate: Adoptable,
  target: Extract<AdoptBody['target'], { kind: 'step' }>,
): Promise<Applied> {
  const row = await findStrategy(db, workspaceId, target.strategyId);
  if (!row) throw notFound('Strategy');
  const step = row.steps[target.stepIndex];
  if (!step) {
    throw invalid(`“${row.name}” has ${row.steps.length} steps; there is no step ${target.stepIndex + 1}`, {
      'target.stepIndex': `Choose a step from 1 to ${row.steps.length}`,
    });
  }
  const efficacy = estimate.efficacy as { mean: number; sd: number };
  const steps: Step[] = row.steps.map((s, i) => (i === target.stepIndex ? ({ ...s, efficacy } as Step) : s));
  const checked = strategySchema.safeParse({ name: row.name, steps });
  if (!checked.success) refuseInvalid(checked.error, 'strategy');
  await updateStrategy(db, row.id, { steps: checked.data.steps, updatedAt: new Date() });
  return {
    targetKind: 'step',
    strategyId: row.id,
    stepIndex: target.stepIndex,
    stepLabel: step.label,
    targetName: row.name,
    path: `steps[${target.stepIndex}].efficacy`,
    previous: step.efficacy,
    value: efficacy,
    note: estimate.note,
  };
}

async function intoFieldSeedbank(
  db: Executor,
  field: FieldRow,
  estimate: Adoptable,
  target: Extract<AdoptBody['target'], { kind: 'field-seedbank' }>,
): Promise<Applied> {
  const layers = estimate.layers ?? [];
  const names = layers.map((l) => l.layer);
  const unknown = [...target.shallowLayers, ...target.deepLayers].filter((l) => !names.includes(l));
  if (unknown.length) {
    throw invalid(`No layer ${unknown.join(', ')} in these cores (layers: ${names.join(', ')})`, {
      target: `Choose among ${names.join(', ')}`,
    });
  }
  if (target.shallowLayers.length + target.deepLayers.length === 0) {
    throw invalid('Choose which layers make the shallow and the deep seedbank', {
      target: 'Choose at least one layer',
    });
  }
  const both = target.shallowLayers.filter((l) => target.deepLayers.includes(l));
  if (both.length)
    throw invalid(`Layer ${both.join(', ')} cannot be both shallow and deep`, {
      target: 'A layer goes to one side only',
    });
  const previous = field.setting.initialSeedbank;
  const value = seedbankFromLayers(layers, target, previous);
  const setting = { ...field.setting, initialSeedbank: value };
  const checked = fieldSchema.safeParse(setting);
  if (!checked.success) refuseInvalid(checked.error, 'field');
  const note = adoptedNote(estimate, target, previous);
  // Fields have no sources map; the notes carry one line about the seedbank, replaced on each adoption.
  const kept = field.notes.split('\n').filter((l) => !l.startsWith('Initial seedbank '));
  const notes = [...kept.filter((l, i) => l !== '' || i < kept.length - 1), note].join('\n').trim();
  await updateField(db, field.id, {
    setting: checked.data,
    ...(notes.length <= 5000 ? { notes } : {}),
    updatedAt: new Date(),
  });
  return {
    targetKind: 'field-seedbank',
    targetName: field.name,
    path: 'initialSeedbank',
    previous,
    value,
    note,
  };
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** Whether the target still holds what was adopted (and, for a step, is still the same step). */
async function isCurrent(db: Database, workspaceId: string, row: AdoptionRow): Promise<boolean> {
  if (row.targetKind === 'profile' && row.profileId) {
    const p = await findProfile(db, workspaceId, row.profileId);
    return (
      !!p &&
      same(readParameter(p.profile, row.path), row.value) &&
      p.sources[sourceKey(row.path)] === row.note
    );
  }
  if (row.targetKind === 'step' && row.strategyId && row.stepIndex !== null) {
    const s = await findStrategy(db, workspaceId, row.strategyId);
    const step = s?.steps[row.stepIndex];
    return !!step && step.label === row.stepLabel && same(step.efficacy, row.value);
  }
  const f = await findField(db, workspaceId, row.fieldId);
  return !!f && same(f.setting.initialSeedbank, row.value);
}

function pathLabel(row: AdoptionRow): string {
  if (row.targetKind === 'step') return `Step ${(row.stepIndex ?? 0) + 1} “${row.stepLabel}”: efficacy`;
  if (row.targetKind === 'field-seedbank') return 'Initial seedbank';
  return parameterLabel(row.path);
}

async function toViews(db: Database, workspaceId: string, rows: AdoptionRow[]): Promise<AdoptionView[]> {
  const names = await userNames(
    db,
    rows.map((r) => r.adoptedBy),
  );
  return Promise.all(
    rows.map(async (r) => ({
      id: r.id,
      estimateKey: r.estimateKey,
      estimateLabel: r.estimateLabel,
      targetKind: r.targetKind,
      targetId: r.profileId ?? r.strategyId ?? r.fieldId,
      targetName: r.targetName,
      path: r.path,
      pathLabel: pathLabel(r),
      previous: r.previous,
      value: r.value,
      note: r.note,
      sources: r.sources,
      current: await isCurrent(db, workspaceId, r),
      adoptedBy: r.adoptedBy ? (names.get(r.adoptedBy) ?? null) : null,
      adoptedAt: r.adoptedAt.toISOString(),
    })),
  );
}

/**
 * Adopts one estimate into its target. The estimate is recomputed from the stored rows (never
 * taken from the request), and the target's change and the log row are written together.
 */
export async function adoptEstimate(
  db: Database,
  userId: string,
  workspaceId: string,
  fieldId: string,
  body: AdoptBody,
) {
  const field = await recordsField(db, userId, workspaceId, fieldId, 'editor');
  const { estimates } = fieldEstimates(
    fieldId,
    await storedUploads(db, fieldId),
    recordsPath(workspaceId, fieldId),
  );
  const estimate = adoptables(estimates).get(body.estimateKey);
  if (!estimate) {
    throw invalid(
      'No such estimate for this field (its upload may have been removed); reload the estimates',
      {
        estimateKey: 'No such estimate for this field',
      },
    );
  }
  if (!estimate.ok)
    throw invalid(`${estimate.label} cannot be adopted: ${estimate.reason}`, {
      estimateKey: estimate.reason ?? '',
    });
  if (estimate.target !== body.target.kind) {
    const where = {
      profile: 'a species profile parameter',
      step: 'a strategy step’s efficacy',
      'field-seedbank': 'the field’s initial seedbank',
    };
    throw invalid(`${estimate.label} goes into ${where[estimate.target]}`, {
      'target.kind': `Choose ${where[estimate.target]}`,
    });
  }
  const id = randomUUID();
  await db.transaction(async (tx) => {
    const target = body.target;
    const done =
      target.kind === 'profile'
        ? await intoProfile(tx, workspaceId, estimate, target)
        : target.kind === 'step'
          ? await intoStep(tx, workspaceId, estimate, target)
          : await intoFieldSeedbank(tx, field, estimate, target);
    await insertAdoption(tx, {
      id,
      workspaceId,
      fieldId,
      estimateKey: estimate.key,
      estimateLabel: estimate.label.slice(0, 300),
      sources: estimate.sources,
      adoptedBy: userId,
      adoptedAt: new Date(),
      ...done,
    });
  });
  const [view] = await toViews(db, workspaceId, [(await findAdoption(db, id))!]);
  return view;
}

export async function listAdoptionViews(db: Database, userId: string, workspaceId: string, fieldId: string) {
  await recordsField(db, userId, workspaceId, fieldId, 'viewer');
  return toViews(db, workspaceId, await listAdoptions(db, fieldId));
}

/** The current source notes of a strategy's steps, keyed like "steps[1].efficacy" (the latest per step). */
export async function stepSourceNotes(db: Database, userId: string, workspaceId: string, strategyId: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  if (!canSee(await visibilityFor(db, workspaceId, userId, role), 'strategyIds', strategyId))
    throw notFound('Strategy');
  if (!(await findStrategy(db, workspaceId, strategyId))) throw notFound('Strategy');
  const notes: Record<string, string> = {};
  for (const row of await listStrategyAdoptions(db, workspaceId, strategyId)) {
    if (await isCurrent(db, workspaceId, row)) notes[row.path] = row.note;
  }
  return notes;
}
