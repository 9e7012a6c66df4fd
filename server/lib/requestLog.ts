/** One log line per API request (debug level; server errors at warn) with status and duration. */
import type { RequestHandler } from 'express';
import type { Logger } from './logger';

/** Middleware logging method, path, status and milliseconds when the response finishes. */
export function requestLog(logger: Logger): RequestHandler {
  return (req, res, next) => {
    const start = process.hrtime.bigint();
    res.on('finish', () => {
      const ms = Number(process.hrtime.bigint() - start) / 1e6;
      const line = `${req.method} ${req.originalUrl.split('?')[0]} ${res.statusCode} ${ms.toFixed(1)} ms`;
      if (res.statusCode >= 500) logger.warn(line);
      else logger.debug(line);
    });
    next();
  };
}
