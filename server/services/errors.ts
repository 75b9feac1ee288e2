import type { ErrorCode } from '../../shared/api/errors';

/** An error meant for the client: the one error handler turns it into the JSON error body. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    readonly headers?: Record<string, string>,
  ) {
    super(message);
  }
}

export const invalid = (message: string, fields?: Record<string, string>) =>
  new AppError(400, 'invalid', message, fields);
export const unauthenticated = (message = 'Sign in to continue') =>
  new AppError(401, 'unauthenticated', message);
export const forbidden = (message = 'Your role in this workspace does not allow that') =>
  new AppError(403, 'forbidden', message);
export const notFound = (what = 'That') => new AppError(404, 'not_found', `${what} was not found`);
export const conflict = (message: string) => new AppError(409, 'conflict', message);
/** A link that was real but no longer works: expired, used or revoked. */
export const gone = (message: string) => new AppError(410, 'gone', message);
export const rateLimited = (retryAfterSeconds: number, message = 'Too many attempts; try again later') =>
  new AppError(429, 'rate_limited', message, undefined, {
    'Retry-After': String(Math.max(1, Math.ceil(retryAfterSeconds))),
  });
