import type { RequestHandler } from 'express';
import type { Database } from '../db/client';
import { authenticateToken } from '../services/tokens';
import { forbidden } from '../services/errors';
import { runWithTokenScope } from '../services/request-scope';

/**
 * `Authorization: Bearer swk_…` signs a script in without a session. Tokens reach
 * workspace data only — never the account, sign-in or token routes.
 */
export function bearerAuth(db: Database): RequestHandler {
  return async (req, res, next) => {
    const header = req.get('authorization');
    if (!header?.startsWith('Bearer ')) return next();
    const { user, scope } = await authenticateToken(db, header.slice(7).trim());
    if (!req.path.startsWith('/workspaces/'))
      throw forbidden('API tokens reach workspace data only (/api/workspaces/…)');
    res.locals.user = user;
    runWithTokenScope(scope, () => next());
  };
}
