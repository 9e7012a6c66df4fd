/** The one error middleware: typed errors → status + `{ error: { code, message, details } }`, anything else → 500 without internals. */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { EngineInputError } from '@shared/engine/errors';
import { AppError } from './errors';
import type { Logger } from './logger';

interface HttpishError {
  status?: number;
  statusCode?: number;
  type?: string;
  code?: string;
  expose?: boolean;
  message?: string;
}

/** Build the error middleware; unexpected errors are logged and answered with a generic 500. */
export function errorMiddleware(logger: Logger): ErrorRequestHandler {
  return (err: unknown, _req, res, next) => {
    if (res.headersSent) {
      next(err);
      return;
    }
    if (err instanceof AppError) {
      res.status(err.status).json({ error: { code: err.code, message: err.message, details: err.details ?? null } });
      return;
    }
    if (err instanceof EngineInputError) {
      res.status(400).json({ error: { code: 'engine_input', message: err.message, details: { issues: err.issues } } });
      return;
    }
    const e = (err ?? {}) as HttpishError;
    const status = e.status ?? e.statusCode;
    if (status && status >= 400 && status < 500) {
      // body-parser (bad JSON, too large), csrf-sync (403) and similar client errors.
      const code = e.code === 'EBADCSRFTOKEN' ? 'csrf' : (e.type ?? 'bad_request').replace(/\./g, '_');
      const message =
        e.code === 'EBADCSRFTOKEN'
          ? 'Missing or invalid CSRF token: fetch GET /api/auth/csrf and send it as the x-csrf-token header.'
          : e.type === 'entity.too.large'
            ? 'Request body is too large.'
            : e.type === 'entity.parse.failed'
              ? 'Request body is not valid JSON.'
              : e.expose && e.message ? e.message : 'Bad request.';
      res.status(status).json({ error: { code, message, details: null } });
      return;
    }
    logger.error('Unhandled error', err);
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server.', details: null } });
  };
}

/** 404 for unknown /api routes, in the same JSON shape. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No route ${req.method} ${req.originalUrl}.`, details: null } });
};
