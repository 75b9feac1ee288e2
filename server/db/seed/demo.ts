import { and, eq } from 'drizzle-orm';
import type { Database } from '../client';
import { memberships, users, workspaces } from '../schema';
import { fields, projections, scenarios, speciesProfiles, strategies } from '../schema-domain';
import { shares } from '../schema-shares';
import { hashPassword } from '../../services/passwords';
import { batchRows, planBatch } from '../../services/projections';
import { runReplicates } from '../../../models/projection/replicates';
import { finishProjection } from '../../projections/outcome';
import { DEMO_PASSWORD, demoPeople, demoWorkspace } from './demo-people';
import { builtInProfiles, demoFields, demoScenario, demoStrategies } from './demo-library';
import { seedTeaching } from './demo-lessons';
import { seedFieldRecords } from './demo-records';

const DEMO_BATCH_ID = '5eedfa00-0000-4000-8000-000000000501';

/** Inserts a row by id unless it is there; returns whether it was added. */
async function ensure(exists: () => Promise<unknown[]>, insert: () => Promise<unknown>): Promise<boolean> {
  if ((await exists()).length) return false;
  await insert();
  return true;
}

/** Seeds the invented demo; running it again adds nothing that is already there. */
export async function seedDemo(db: Database) {
  let added = 0;
  const now = new Date();
  const count = (b: boolean) => (added += b ? 1 : 0);
  count(
    await ensure(
      () => db.select({ id: workspaces.id }).from(workspaces).where(eq(workspaces.id, demoWorkspace.id)),
      () => db.insert(workspaces).values({ ...demoWorkspace, personal: false, createdAt: now }),
    ),
  );
  for (const person of demoPeople) {
    const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, person.email));
    if (user) continue;
    await db.transaction(async (tx) => {
      await tx.insert(users).values({
        id: person.id,
        email: person.email,
        name: person.name,
        passwordHash: await hashPassword(DEMO_PASSWORD),
        createdAt: now,
        passwordChangedAt: now,
      });
      await tx
        .insert(memberships)
        .values({ workspaceId: demoWorkspace.id, userId: person.id, role: person.role, createdAt: now });
    });
    added++;
  }
  for (const p of builtInProfiles) {
    count(
      await ensure(
        () => db.select({ id: speciesProfiles.id }).from(speciesProfiles).where(eq(speciesProfiles.id, p.id)),
        () =>
          db.insert(speciesProfiles).values({
            id: p.id,
            workspaceId: null,
            name: p.profile.name,
            builtIn: true,
            profile: p.profile,
            sources: p.sources,
            createdAt: now,
            updatedAt: now,
          }),
      ),
    );
  }
  for (const f of demoFields) {
    count(
      await ensure(
        () => db.select({ id: fields.id }).from(fields).where(eq(fields.id, f.id)),
        () =>
          db.insert(fields).values({
            ...f,
            workspaceId: demoWorkspace.id,
            name: f.setting.name,
            createdAt: now,
            updatedAt: now,
          }),
      ),
    );
  }
  for (const s of demoStrategies) {
    count(
      await ensure(
        () => db.select({ id: strategies.id }).from(strategies).where(eq(strategies.id, s.id)),
        () =>
          db
            .insert(strategies)
            .values({ ...s, workspaceId: demoWorkspace.id, maxRates: [], createdAt: now, updatedAt: now }),
      ),
    );
  }
  const scenarioAdded = await ensure(
    () => db.select({ id: scenarios.id }).from(scenarios).where(eq(scenarios.id, demoScenario.id)),
    () =>
      db
        .insert(scenarios)
        .values({ ...demoScenario, workspaceId: demoWorkspace.id, createdAt: now, updatedAt: now }),
  );
  if (scenarioAdded) {
    await seedCompletedComparison(db, now);
    added++;
  }
  // The grower (a viewer) sees the demo comparison because it is shared with them.
  const grower = demoPeople.find((p) => p.role === 'viewer')!;
  count(
    await ensure(
      () =>
        db
          .select({ batchId: shares.batchId })
          .from(shares)
          .where(and(eq(shares.batchId, DEMO_BATCH_ID), eq(shares.userId, grower.id))),
      () =>
        db
          .insert(shares)
          .values({
            workspaceId: demoWorkspace.id,
            batchId: DEMO_BATCH_ID,
            userId: grower.id,
            sharedBy: demoPeople[1].id,
            createdAt: now,
          }),
    ),
  );
  added += await seedTeaching(db, now);
  added += await seedFieldRecords(db, now);
  return added ? `added ${added} demo rows` : 'already present';
}

/**
 * The first screen should already show a comparison, so the demo scenario gets one
 * finished launch, computed here with the engine's functions the workers also use.
 */
async function seedCompletedComparison(db: Database, now: Date) {
  const profile = builtInProfiles.find((p) => p.id === demoScenario.profileId)!;
  const field = demoFields.find((f) => f.id === demoScenario.fieldId)!;
  const parts = {
    profile: { profile: profile.profile },
    field: { setting: field.setting },
    strategies: demoStrategies.map((s) => ({ id: s.id, name: s.name, steps: s.steps })),
  };
  const planned = planBatch(parts, demoScenario, demoScenario.seed, {
    strategyId: demoStrategies[2].id,
    year: 4,
  });
  const rows = batchRows(
    planned,
    {
      workspaceId: demoWorkspace.id,
      scenarioId: demoScenario.id,
      batchId: DEMO_BATCH_ID,
      userId: demoPeople[1].id,
    },
    now,
  );
  await db.insert(projections).values(
    rows.map((r) => {
      const scenario = r.snapshot;
      const result = finishProjection(scenario, runReplicates(scenario, 0, scenario.replicates));
      return {
        ...r,
        status: 'done' as const,
        replicatesDone: r.replicates,
        result,
        startedAt: now,
        finishedAt: new Date(),
      };
    }),
  );
}
