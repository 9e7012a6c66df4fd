/** Stored transient analyses: POST /variants/:vid/timeline and /variants/:vid/timing (engineers and owners). */
import { Router } from 'express';
import { timelineRequestSchema, timingRequestSchema } from '@shared/schemas/transient';
import { authorize } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { variantTimeline, variantTiming } from './transientService';

/** Build the transient router. */
export function transientRouter(): Router {
  const r = Router();

  r.post('/variants/:vid/timeline', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'analysis.run');
    res.json(await variantTimeline(a, a.variantId!, validate(timelineRequestSchema, req.body)));
  });

  r.post('/variants/:vid/timing', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'analysis.run');
    res.json(await variantTiming(a, a.variantId!, validate(timingRequestSchema, req.body)));
  });

  return r;
}
