/** /api/auth: CSRF token, who am I (and own name/password), first-owner setup, sign-in, sign-out. */
import { Router } from 'express';
import { loginSchema, passwordChangeSchema, profileSchema, setupSchema } from '@shared/schemas/auth';
import type { AppContext } from '../../lib/context';
import { validate } from '../../lib/validate';
import { requireUserId } from '../../lib/permissions';
import { UnauthorizedError } from '../../lib/errors';
import { credentialLimiter } from '../../lib/rateLimits';
import * as service from './authService';
import * as account from './accountService';
import { endSession, startSession } from './signIn';

/** Build the auth router. */
export function authRouter(ctx: AppContext): Router {
  const r = Router();
  const limiter = credentialLimiter(ctx.config.loginRateLimit);

  r.get('/csrf', (req, res) => {
    res.json({ token: ctx.generateCsrfToken(req) });
  });

  r.get('/me', async (req, res) => {
    const view = await service.me(requireUserId(req));
    if (!view) {
      await endSession(req);
      throw new UnauthorizedError();
    }
    res.json(view);
  });

  r.patch('/me', async (req, res) => {
    const userId = requireUserId(req);
    await account.rename(userId, validate(profileSchema, req.body).name);
    res.json(await service.me(userId));
  });

  r.post('/password', limiter, async (req, res) => {
    const userId = requireUserId(req);
    await account.changePassword(userId, validate(passwordChangeSchema, req.body), ctx.config.argon2);
    const view = await startSession(req, userId, ctx.generateCsrfToken);
    await ctx.endOtherSessions(userId, req.sessionID);
    res.json(view);
  });

  r.get('/setup', async (_req, res) => {
    res.json({ needed: await service.setupNeeded() });
  });

  r.post('/setup', async (req, res) => {
    const input = validate(setupSchema, req.body);
    const userId = await service.setup(input, ctx.config.argon2);
    res.status(201).json(await startSession(req, userId, ctx.generateCsrfToken));
  });

  r.post('/login', limiter, async (req, res) => {
    const input = validate(loginSchema, req.body);
    const userId = await service.login(input, ctx.config.argon2);
    res.json(await startSession(req, userId, ctx.generateCsrfToken));
  });

  r.post('/logout', async (req, res) => {
    await endSession(req);
    res.clearCookie('heatloom.sid');
    res.status(204).end();
  });

  return r;
}
