/** Invitations: owners invite, list and revoke; anyone with the link looks it up and accepts. */
import { Router } from 'express';
import { z } from 'zod';
import { invitationAcceptSchema, invitationCreateSchema } from '@shared/schemas/invitations';
import type { AppContext } from '../../lib/context';
import { authorize, parseId, requireUserId } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { NotFoundError } from '../../lib/errors';
import { credentialLimiter } from '../../lib/rateLimits';
import { startSession } from '../auth/signIn';
import * as service from './invitationsService';
import * as repo from './invitationsRepository';

const tokenSchema = z.string().min(20).max(100).regex(/^[A-Za-z0-9_-]+$/);

function token(raw: unknown): string {
  const r = tokenSchema.safeParse(raw);
  if (!r.success) throw new NotFoundError('Invitation');
  return r.data;
}

/** Build the invitations router. */
export function invitationsRouter(ctx: AppContext): Router {
  const r = Router();
  const limiter = credentialLimiter(ctx.config.loginRateLimit);

  r.post('/workspaces/:wid/invitations', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'invitations.manage');
    const input = validate(invitationCreateSchema, req.body);
    res.status(201).json(await service.invite(ctx, a.workspaceId, requireUserId(req), input));
  });

  r.get('/workspaces/:wid/invitations', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'invitations.manage');
    res.json(await repo.listInvitations(a.workspaceId));
  });

  r.delete('/workspaces/:wid/invitations/:id', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'invitations.manage');
    if (!(await repo.deleteInvitation(a.workspaceId, parseId(req.params.id, 'Invitation')))) throw new NotFoundError('Invitation');
    res.status(204).end();
  });

  r.get('/invitations/:token', async (req, res) => {
    res.json(await service.lookup(token(req.params.token)));
  });

  r.post('/invitations/:token/accept', limiter, async (req, res) => {
    const input = validate(invitationAcceptSchema, req.body);
    const userId = await service.accept(ctx, token(req.params.token), input);
    res.json(await startSession(req, userId, ctx.generateCsrfToken));
  });

  return r;
}
