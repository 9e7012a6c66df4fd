/** /api/auth/password-reset: ask for a link by e-mail (same answer for every address), look a link up, set the new password. */
import { Router } from 'express';
import { z } from 'zod';
import { PASSWORD_RESET_REQUESTED, passwordResetRequestSchema, passwordResetSchema } from '@shared/schemas/passwordReset';
import type { AppContext } from '../../lib/context';
import { validate } from '../../lib/validate';
import { credentialLimiter, requestLimiter } from '../../lib/rateLimits';
import * as service from './passwordResetService';

const tokenSchema = z.string().min(20).max(100).regex(/^[A-Za-z0-9_-]+$/);

function token(raw: unknown): string {
  const r = tokenSchema.safeParse(raw);
  if (!r.success) throw service.linkGone();
  return r.data;
}

/** Build the password-reset router. */
export function passwordResetRouter(ctx: AppContext): Router {
  const r = Router();
  const asks = requestLimiter(ctx.config.loginRateLimit);
  const failures = credentialLimiter(ctx.config.loginRateLimit);

  // The lookup and the mail run after the answer, so neither the answer nor its timing tells whether the account exists.
  r.post('/auth/password-reset', asks, async (req, res) => {
    const { email } = validate(passwordResetRequestSchema, req.body);
    res.status(202).json({ message: PASSWORD_RESET_REQUESTED });
    await service.requestReset(ctx, email).catch((err: Error) => ctx.logger.error('Password-reset request failed', err));
  });

  r.get('/auth/password-reset/:token', failures, async (req, res) => {
    res.json(await service.lookup(token(req.params.token)));
  });

  r.post('/auth/password-reset/:token', failures, async (req, res) => {
    const input = validate(passwordResetSchema, req.body);
    await service.reset(ctx, token(req.params.token), input);
    res.status(204).end();
  });

  return r;
}
