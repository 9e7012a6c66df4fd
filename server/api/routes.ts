/** Mounts every feature router under /api. */
import { Router } from 'express';
import type { AppContext } from '../lib/context';
import { authRouter } from './auth/authRouter';
import { outboxRouter } from './outbox/outboxRouter';

/** All API routes (mounted at /api by app.ts). */
export function apiRoutes(ctx: AppContext): Router {
  const r = Router();
  r.use('/auth', authRouter(ctx));
  r.use(outboxRouter());
  return r;
}
