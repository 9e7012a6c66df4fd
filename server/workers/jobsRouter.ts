/** Background analyses over HTTP: start (202 + job id), poll progress/result, cancel. */
import { Router } from 'express';
import { z } from 'zod';
import type { Model } from '@shared/schemas/model';
import { authorize, requireUserId } from '../lib/permissions';
import { validate } from '../lib/validate';
import { NotFoundError } from '../lib/errors';
import { findVariant } from '../api/variants/variantsRepository';
import { cancelJob, getJob, startJob } from './jobs';

/** Body of POST /variants/:vid/jobs: which analysis, and its size. */
export const jobStartSchema = z.object({
  kind: z.literal('impedance'),
  /** Output times of the impedance curve (default 60, as the engine's IMPEDANCE_DEFAULTS). */
  count: z.number().int().min(8).max(200).default(60),
}).strict();

const jobId = z.object({ id: z.uuid() });

/** Build the jobs router. */
export function jobsRouter(): Router {
  const r = Router();

  r.post('/variants/:vid/jobs', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'analysis.run');
    const body = validate(jobStartSchema, req.body);
    const v = await findVariant(a.variantId!);
    if (!v) throw new NotFoundError('Variant');
    const model = JSON.parse(v.model) as Model;
    res.status(202).json(startJob(a.userId, a.variantId!, { kind: body.kind, model, count: body.count }));
  });

  r.get('/jobs/:id', (req, res) => {
    const userId = requireUserId(req);
    res.json(getJob(userId, validate(jobId, req.params).id));
  });

  r.delete('/jobs/:id', (req, res) => {
    const userId = requireUserId(req);
    res.json(cancelJob(userId, validate(jobId, req.params).id));
  });

  return r;
}
