/** GET /api/projects/:pid/activity: the project's activity trail. */
import { Router } from 'express';
import { z } from 'zod';
import { authorize } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { listActivity } from './activityRepository';

const querySchema = z.object({ limit: z.coerce.number().int().min(1).max(1000).default(200) });

/** Build the activity router. */
export function activityRouter(): Router {
  const r = Router();
  r.get('/projects/:pid/activity', async (req, res) => {
    const a = await authorize(req, 'project', req.params.pid, 'workspace.read');
    const { limit } = validate(querySchema, req.query);
    res.json(await listActivity(a.projectId!, limit));
  });
  return r;
}
