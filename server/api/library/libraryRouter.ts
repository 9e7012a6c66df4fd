/** Workspace library: materials and part templates (owners and engineers edit, everyone reads). */
import { Router } from 'express';
import {
  materialCreateSchema, materialPatchSchema, partTemplateCreateSchema, partTemplatePatchSchema,
} from '@shared/schemas/library';
import { authorize } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { NotFoundError } from '../../lib/errors';
import * as materials from './materialsRepository';
import * as templates from './partTemplatesRepository';

/** Build the library router. */
export function libraryRouter(): Router {
  const r = Router();

  r.get('/workspaces/:wid/materials', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'workspace.read');
    res.json(await materials.listMaterials(a.workspaceId));
  });
  r.post('/workspaces/:wid/materials', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'library.edit');
    res.status(201).json(await materials.createMaterial(a.workspaceId, validate(materialCreateSchema, req.body)));
  });
  r.patch('/materials/:id', async (req, res) => {
    const a = await authorize(req, 'material', req.params.id, 'library.edit');
    const m = await materials.updateMaterial(a.recordId!, validate(materialPatchSchema, req.body));
    if (!m) throw new NotFoundError('Material');
    res.json(m);
  });
  r.delete('/materials/:id', async (req, res) => {
    const a = await authorize(req, 'material', req.params.id, 'library.edit');
    await materials.deleteMaterial(a.recordId!);
    res.status(204).end();
  });

  r.get('/workspaces/:wid/part-templates', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'workspace.read');
    res.json(await templates.listPartTemplates(a.workspaceId));
  });
  r.post('/workspaces/:wid/part-templates', async (req, res) => {
    const a = await authorize(req, 'workspace', req.params.wid, 'library.edit');
    res.status(201).json(await templates.createPartTemplate(a.workspaceId, validate(partTemplateCreateSchema, req.body)));
  });
  r.patch('/part-templates/:id', async (req, res) => {
    const a = await authorize(req, 'partTemplate', req.params.id, 'library.edit');
    const t = await templates.updatePartTemplate(a.recordId!, validate(partTemplatePatchSchema, req.body));
    if (!t) throw new NotFoundError('Part template');
    res.json(t);
  });
  r.delete('/part-templates/:id', async (req, res) => {
    const a = await authorize(req, 'partTemplate', req.params.id, 'library.edit');
    await templates.deletePartTemplate(a.recordId!);
    res.status(204).end();
  });

  return r;
}
