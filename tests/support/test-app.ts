// Builds a real Seedwake app against the test MariaDB that `npm test` started.
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createContext, type ContextOptions } from '../../server/context-factory';

export const TEST_ORIGIN = 'http://seedwake.test';

export function testApp(options: ContextOptions & { publicOrigin?: string | null } = {}) {
  const publicOrigin = options.publicOrigin === null ? undefined : (options.publicOrigin ?? TEST_ORIGIN);
  const config = { ...loadConfig(), publicOrigin, cookieSecure: false };
  const ctx = createContext(config, { projectionThreads: 1, ...options });
  const app = createApp(ctx);
  return {
    app,
    ctx,
    async close() {
      await ctx.projections.runner.stop();
      await ctx.pool.end();
    },
  };
}

/** A cookie-keeping client that sends our Origin, as a browser on a Seedwake page does. */
export function browserLike(app: Parameters<typeof request.agent>[0]) {
  return request.agent(app).set('Origin', TEST_ORIGIN);
}

export const uniqueEmail = (label = 'user') => `${label}-${randomUUID().slice(0, 8)}@test.example`;
export const PASSWORD = 'correct horse battery';

export async function signUp(app: Parameters<typeof request.agent>[0], label = 'user') {
  const agent = browserLike(app);
  const email = uniqueEmail(label);
  const res = await agent
    .post('/api/auth/sign-up')
    .send({ email, password: PASSWORD, name: `Test ${label}` });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return {
    agent,
    email,
    user: res.body.user as { id: string },
    workspaceId: res.body.memberships[0].workspace.id as string,
  };
}
