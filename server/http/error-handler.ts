import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { AppError } from '../services/errors';

type BodyParserError = Error & { type?: string; status?: number; limit?: number };

/** The single place errors become responses; nothing else writes error bodies. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err: unknown, req, res, next) => {
    if (res.headersSent) return next(err);
    const send = (status: number, code: string, message: string, fields?: Record<string, string>) =>
      res.status(status).json({ error: fields ? { code, message, fields } : { code, message } });

    if (err instanceof AppError) {
      if (err.headers) res.set(err.headers);
      return send(err.status, err.code, err.message, err.fields);
    }
    const bp = err as BodyParserError;
    if (bp?.type === 'entity.parse.failed')
      return send(400, 'malformed_json', 'The request body is not valid JSON');
    if (bp?.type === 'entity.too.large') {
      return send(
        413,
        'too_large',
        `The request body is larger than the ${Math.round((bp.limit ?? 0) / 1024)} kB allowed`,
      );
    }
    if (bp?.type === 'encoding.unsupported' || bp?.type === 'charset.unsupported') {
      return send(415, 'invalid', 'Send the body as UTF-8 JSON');
    }
    if (bp?.status && bp.status >= 400 && bp.status < 500)
      return send(bp.status, 'invalid', 'The request could not be read');
    (req.log ?? logger).error({ err }, 'unhandled error');
    return send(500, 'internal', 'Something went wrong on our side; the error was logged');
  };
}

export const notFoundApi: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No API route ${req.method} ${req.path}` } });
};
