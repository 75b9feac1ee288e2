import type { Request, RequestHandler } from 'express';
import type { Database } from '../db/client';
import type { UserRow } from '../db/queries/users';
import { currentUser } from '../services/auth';
import { unauthenticated } from '../services/errors';

declare module 'express-serve-static-core' {
  interface Locals {
    user?: UserRow;
  }
}

/** Puts the signed-in user (if any) on res.locals; a stale session is destroyed. */
export function loadUser(db: Database): RequestHandler {
  return async (req, res, next) => {
    const user = await currentUser(db, req.session?.userId, req.session?.authAt);
    if (user) res.locals.user = user;
    else if (req.session?.userId) await new Promise<void>((r) => req.session.destroy(() => r()));
    next();
  };
}

export function signedInUser(res: { locals: { user?: UserRow } }) {
  const user = res.locals.user;
  if (!user) throw unauthenticated();
  return user;
}

export const clientIp = (req: Request) => req.ip ?? req.socket.remoteAddress ?? 'unknown';
