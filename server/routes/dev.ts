import { Router } from 'express';
import type { AppContext } from '../context';
import { outbox } from '../services/mail';

/**
 * Development only: what the local fake SMTP server received. app.ts mounts this only
 * when the fake is in use, which is never in production, so there it answers 404.
 */
export function devRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/dev/outbox', async (_req, res) => {
    res.json(await outbox(ctx.db));
  });
  return r;
}
