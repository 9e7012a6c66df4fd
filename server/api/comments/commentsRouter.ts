/** GET/POST /api/variants/:vid/comments. */
import { Router } from 'express';
import { commentCreateSchema } from '@shared/schemas/review';
import { authorize } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import * as repo from './commentsRepository';

/** Build the comments router. */
export function commentsRouter(): Router {
  const r = Router();

  r.get('/variants/:vid/comments', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    res.json(await repo.listComments(a.variantId!));
  });

  r.post('/variants/:vid/comments', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'comment.write');
    const input = validate(commentCreateSchema, req.body);
    res.status(201).json(await repo.addComment(a.projectId!, a.variantId!, a.userId, input));
  });

  return r;
}
