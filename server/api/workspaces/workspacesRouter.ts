/** /api/workspaces: my workspaces, create/rename, its members (roles and removal by owners; anyone may leave). */
import { Router } from 'express';
import { memberRoleSchema, workspaceNameSchema } from '@shared/schemas/workspaces';
import { authorize, parseId, requireUserId } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { ConflictError, NotFoundError } from '../../lib/errors';
import * as repo from './workspacesRepository';

const lastOwner = () => new ConflictError('last_owner', 'A workspace needs at least one owner: make someone else owner first.');

/** Build the workspaces router. */
export function workspacesRouter(): Router {
  const r = Router();

  r.get('/workspaces', async (req, res) => {
    res.json(await repo.listForUser(requireUserId(req)));
  });

  r.post('/workspaces', async (req, res) => {
    const userId = requireUserId(req);
    const { name } = validate(workspaceNameSchema, req.body);
    res.status(201).json(await repo.createWorkspace(name, userId));
  });

  r.get('/workspaces/:wid', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'workspace.read');
    res.json(await repo.findWorkspace(a.workspaceId, a.role));
  });

  r.patch('/workspaces/:wid', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'workspace.manage');
    const { name } = validate(workspaceNameSchema, req.body);
    await repo.renameWorkspace(a.workspaceId, name);
    res.json(await repo.findWorkspace(a.workspaceId, a.role));
  });

  r.get('/workspaces/:wid/members', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'workspace.read');
    res.json(await repo.listMembers(a.workspaceId));
  });

  r.patch('/workspaces/:wid/members/:uid', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'members.manage');
    const uid = parseId(req.params.uid, 'Member');
    const { role } = validate(memberRoleSchema, req.body);
    const result = await repo.changeRole(a.workspaceId, uid, role);
    if (result === null) throw new NotFoundError('Member');
    if (result === 'last_owner') throw lastOwner();
    res.json(result);
  });

  r.delete('/workspaces/:wid/members/:uid', async (req, res) => {
    const uid = parseId(req.params.uid, 'Member');
    const leaving = uid === requireUserId(req);
    const a = await authorize(req, 'workspace', req.params.wid, leaving ? 'workspace.read' : 'members.manage');
    const result = await repo.removeMember(a.workspaceId, uid);
    if (result === false) throw new NotFoundError('Member');
    if (result === 'last_owner') throw lastOwner();
    res.status(204).end();
  });

  return r;
}
