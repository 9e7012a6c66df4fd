/** Projects: list/create in a workspace; read, rename, delete. */
import { Router } from 'express';
import { projectCreateSchema, projectPatchSchema } from '@shared/schemas/projects';
import { authorize } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { NotFoundError } from '../../lib/errors';
import * as repo from './projectsRepository';

/** Build the projects router. */
export function projectsRouter(): Router {
  const r = Router();

  r.get('/workspaces/:wid/projects', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'workspace.read');
    res.json(await repo.listProjects(a.workspaceId));
  });

  r.post('/workspaces/:wid/projects', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'design.edit');
    const input = validate(projectCreateSchema, req.body);
    res.status(201).json(await repo.createProject(a.workspaceId, input, a.userId));
  });

  r.get('/projects/:pid', async (req, res) => {
    const a = await authorize(req, 'project', req.params.pid, 'workspace.read');
    res.json(await repo.getProject(a.projectId!));
  });

  r.patch('/projects/:pid', async (req, res) => {
    const a = await authorize(req, 'project', req.params.pid, 'design.edit');
    const patch = validate(projectPatchSchema, req.body);
    const p = await repo.updateProject(a.projectId!, patch);
    if (!p) throw new NotFoundError('Project');
    res.json(p);
  });

  r.delete('/projects/:pid', async (req, res) => {
    const a = await authorize(req, 'project', req.params.pid, 'project.delete');
    await repo.deleteProject(a.projectId!);
    res.status(204).end();
  });

  return r;
}
