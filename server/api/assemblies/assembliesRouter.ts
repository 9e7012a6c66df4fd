/** Assemblies: list/create in a project; read, rename, delete. */
import { Router } from 'express';
import { assemblyCreateSchema, assemblyPatchSchema } from '@shared/schemas/projects';
import { authorize } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { NotFoundError } from '../../lib/errors';
import * as repo from './assembliesRepository';

/** Build the assemblies router. */
export function assembliesRouter(): Router {
  const r = Router();

  r.get('/projects/:pid/assemblies', async (req, res) => {
    const a = await authorize(req, 'project', req.params.pid, 'workspace.read');
    res.json(await repo.listAssemblies(a.projectId!));
  });

  r.post('/projects/:pid/assemblies', async (req, res) => {
    const a = await authorize(req, 'project', req.params.pid, 'design.edit');
    const input = validate(assemblyCreateSchema, req.body);
    res.status(201).json(await repo.createAssembly(a.projectId!, input, a.userId));
  });

  r.get('/assemblies/:aid', async (req, res) => {
    const a = await authorize(req, 'assembly', req.params.aid, 'workspace.read');
    res.json(await repo.getAssembly(a.assemblyId!));
  });

  r.patch('/assemblies/:aid', async (req, res) => {
    const a = await authorize(req, 'assembly', req.params.aid, 'design.edit');
    const patch = validate(assemblyPatchSchema, req.body);
    const result = await repo.updateAssembly(a.assemblyId!, patch);
    if (!result) throw new NotFoundError('Assembly');
    res.json(result);
  });

  r.delete('/assemblies/:aid', async (req, res) => {
    const a = await authorize(req, 'assembly', req.params.aid, 'design.edit');
    await repo.deleteAssembly(a.assemblyId!);
    res.status(204).end();
  });

  return r;
}
