/** GET /api/health: liveness for scripts and probes (database reachable, app version). */
import { Router } from 'express';
import pkg from '../../package.json';
import { countUsers } from './auth/authRepository';

/** Build the health router. */
export function healthRouter(): Router {
  const r = Router();
  r.get('/health', async (_req, res) => {
    await countUsers();
    res.json({ ok: true, version: pkg.version });
  });
  return r;
}
