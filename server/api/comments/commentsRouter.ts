/** GET/POST /api/variants/:vid/comments; DELETE /api/comments/:id (author or owner). */
import { Router } from 'express';
import { commentCreateSchema } from '@shared/schemas/review';
import { authorize } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { ForbiddenError } from '../../lib/errors';
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

  r.delete('/comments/:id', async (req, res) => {
    const a = await authorize(req, 'comment', req.params.id, 'comment.write');
    if (a.role !== 'owner' && (await repo.commentAuthor(a.recordId!)) !== a.userId) {
      throw new ForbiddenError('Only the author or a workspace owner may delete a comment.');
    }
    await repo.deleteComment(a.recordId!);
    res.status(204).end();
  });

  return r;
}
