/** GET /api/workspaces/:wid/outbox: the mail the local fake SMTP server received for this workspace (owners). */
import { Router } from 'express';
import { authorize } from '../../lib/permissions';
import { listOutbox } from './outboxRepository';

/** Build the outbox router. */
export function outboxRouter(): Router {
  const r = Router();
  r.get('/workspaces/:wid/outbox', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'outbox.read');
    res.json(await listOutbox(a.workspaceId));
  });
  return r;
}
