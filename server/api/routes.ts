/** Mounts every feature router under /api. */
import { Router } from 'express';
import type { AppContext } from '../lib/context';
import { authRouter } from './auth/authRouter';
import { outboxRouter } from './outbox/outboxRouter';
import { workspacesRouter } from './workspaces/workspacesRouter';
import { invitationsRouter } from './invitations/invitationsRouter';
import { passwordResetRouter } from './passwordReset/passwordResetRouter';
import { projectsRouter } from './projects/projectsRouter';
import { assembliesRouter } from './assemblies/assembliesRouter';
import { variantsRouter } from './variants/variantsRouter';
import { commentsRouter } from './comments/commentsRouter';
import { activityRouter } from './activity/activityRouter';
import { libraryRouter } from './library/libraryRouter';
import { solveRouter } from './solve/solveRouter';
import { transientRouter } from './transient/transientRouter';
import { healthRouter } from './health';
import { ioRouter } from './io/ioRouter';
import { jobsRouter } from '../workers/jobsRouter';

/** All API routes (mounted at /api by app.ts). */
export function apiRoutes(ctx: AppContext): Router {
  const r = Router();
  r.use(healthRouter());
  r.use('/auth', authRouter(ctx));
  r.use(passwordResetRouter(ctx));
  r.use(workspacesRouter());
  r.use(invitationsRouter(ctx));
  r.use(outboxRouter());
  r.use(projectsRouter());
  r.use(assembliesRouter());
  r.use(variantsRouter(ctx));
  r.use(commentsRouter());
  r.use(activityRouter());
  r.use(libraryRouter());
  r.use(solveRouter());
  r.use(transientRouter());
  r.use(ioRouter());
  r.use(jobsRouter());
  return r;
}
