/** Rate limiters for credential endpoints: failed attempts (or, for mail-sending requests, all requests) per client address per 15 minutes. */
import { rateLimit } from 'express-rate-limit';
import type { RequestHandler } from 'express';

/** Window of the credential limiters. */
export const CREDENTIAL_WINDOW_MS = 15 * 60 * 1000;

function limiter(limit: number, failuresOnly: boolean, message: string): RequestHandler {
  return rateLimit({
    windowMs: CREDENTIAL_WINDOW_MS,
    limit,
    skipSuccessfulRequests: failuresOnly,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message, details: null } });
    },
  });
}

/** A limiter counting only failed requests (status ≥ 400); answers 429 in the API error shape. */
export function credentialLimiter(limit: number): RequestHandler {
  return limiter(limit, true, 'Too many failed attempts. Wait 15 minutes and try again.');
}

/** A limiter counting every request, for routes that always succeed but send mail (password-reset requests). */
export function requestLimiter(limit: number): RequestHandler {
  return limiter(limit, false, 'Too many requests. Wait 15 minutes and try again.');
}
