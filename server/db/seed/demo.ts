import { eq } from 'drizzle-orm';
import type { Database } from '../client';
import { memberships, users, workspaces } from '../schema';
import { hashPassword } from '../../services/passwords';
import { DEMO_PASSWORD, demoPeople, demoWorkspace } from './demo-people';

/** Seeds the invented demo; running it again adds nothing that is already there. */
export async function seedDemo(db: Database) {
  let added = 0;
  const [existing] = await db.select().from(workspaces).where(eq(workspaces.id, demoWorkspace.id));
  const now = new Date();
  if (!existing) {
    await db.insert(workspaces).values({ ...demoWorkspace, personal: false, createdAt: now });
    added++;
  }
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
  return added ? `added ${added} demo rows` : 'already present';
}
