import type { RequestHandler } from 'express';
import { AppError } from '../services/errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * CSRF protection by verified Origin (OWASP CSRF cheat sheet, "Verifying origin with
 * standard headers"): a state-changing request that carries the session cookie must
 * come from our own origin. Browsers always send Origin on cross-origin and on
 * same-origin POST/PUT/PATCH/DELETE fetches; Referer is the fallback. Requests that
 * authenticate with a bearer token carry no ambient credential and need no check.
 */
export function verifyOrigin(publicOrigin: string | undefined): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    if (req.get('authorization')?.startsWith('Bearer ')) return next();
    const allowed = publicOrigin ?? `${req.protocol}://${req.get('host')}`;
    const origin = req.get('origin') ?? originOf(req.get('referer'));
    if (origin && origin === allowed) return next();
    next(new AppError(403, 'csrf', 'This request did not come from a Seedwake page (Origin check failed)'));
  };
}

function originOf(url: string | undefined) {
  if (!url) return undefined;
  try {
    return new URL(url).origin;
  } catch {
    return undefined;
  }
}
