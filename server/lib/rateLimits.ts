/** Rate limiters for credential endpoints: failed attempts per client address per 15 minutes. */
import { rateLimit } from 'express-rate-limit';
import type { RequestHandler } from 'express';

/** Window of the credential limiters. */
export const CREDENTIAL_WINDOW_MS = 15 * 60 * 1000;

/** A limiter counting only failed requests (status ≥ 400); answers 429 in the API error shape. */
export function credentialLimiter(limit: number): RequestHandler {
  return rateLimit({
    windowMs: CREDENTIAL_WINDOW_MS,
    limit,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => {
      res.status(429).json({
        error: { code: 'rate_limited', message: 'Too many failed attempts. Wait 15 minutes and try again.', details: null },
      });
    },
  });
}
