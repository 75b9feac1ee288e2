import { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { AppContext } from '../context';

export function healthRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/health', async (_req, res) => {
    const started = Date.now();
    try {
      await ctx.db.execute(sql`SELECT 1`);
      res.json({ status: 'ok', database: { status: 'ok', latencyMs: Date.now() - started } });
    } catch (err) {
      ctx.logger.warn({ err }, 'health check: database unreachable');
      res.status(503).json({ status: 'degraded', database: { status: 'unreachable' } });
    }
  });
  return r;
}
