/** Variants: list/create in an assembly; read, save (optimistic), copy, delete, history, restore, review status. */
import { Router } from 'express';
import {
  variantCopySchema, variantCreateSchema, variantRestoreSchema, variantSaveSchema, variantStatusChangeSchema,
} from '@shared/schemas/variants';
import type { AppContext } from '../../lib/context';
import { authorize, parseId } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { NotFoundError } from '../../lib/errors';
import * as repo from './variantsRepository';
import * as service from './variantsService';
import { changeStatus } from './reviewService';

/** Build the variants router. */
export function variantsRouter(ctx: AppContext): Router {
  const r = Router();

  r.get('/assemblies/:aid/variants', async (req, res) => {
    const a = await authorize(req, 'assembly', req.params.aid, 'workspace.read');
    res.json(await repo.listVariants(a.assemblyId!));
  });

  r.post('/assemblies/:aid/variants', async (req, res) => {
    const a = await authorize(req, 'assembly', req.params.aid, 'design.edit');
    res.status(201).json(await service.create(a, validate(variantCreateSchema, req.body)));
  });

  r.get('/variants/:vid', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    res.json(await service.detail(a, a.variantId!));
  });

  r.put('/variants/:vid', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'design.edit');
    res.json(await service.save(a, a.variantId!, validate(variantSaveSchema, req.body)));
  });

  r.post('/variants/:vid/copy', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'design.edit');
    res.status(201).json(await service.copy(a, a.variantId!, validate(variantCopySchema, req.body)));
  });

  r.delete('/variants/:vid', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'design.edit');
    await service.remove(a, a.variantId!);
    res.status(204).end();
  });

  r.get('/variants/:vid/versions', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    res.json(await repo.listVersions(a.variantId!));
  });

  r.get('/variants/:vid/versions/:n', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    const found = await repo.findVersion(a.variantId!, parseId(req.params.n, 'Version'));
    if (!found) throw new NotFoundError('Version');
    res.json(found);
  });

  r.post('/variants/:vid/versions/:n/restore', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'design.edit');
    const n = parseId(req.params.n, 'Version');
    const { version } = validate(variantRestoreSchema, req.body);
    res.json(await service.restore(a, a.variantId!, n, version));
  });

  r.patch('/variants/:vid/status', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    const { status, message } = validate(variantStatusChangeSchema, req.body);
    res.json(await changeStatus(ctx, a, a.variantId!, status, message));
  });

  return r;
}
