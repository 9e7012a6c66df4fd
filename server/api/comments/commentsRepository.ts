/** Comments on variants. */
import type { Comment, CommentCreate } from '@shared/schemas/review';
import { UserModel } from '../../db/models/accounts';
import { CommentModel } from '../../db/models/records';
import { recordActivity } from '../activity/activityRepository';

const toComment = (c: CommentModel): Comment => ({
  id: c.id, variantId: c.variantId, userId: c.authorId, userName: c.author?.name ?? null, text: c.text, partId: c.partId,
  createdAt: c.createdAt.toISOString(),
});

/** Comments of a variant, oldest first. */
export async function listComments(variantId: number): Promise<Comment[]> {
  const rows = await CommentModel.findAll({
    where: { variantId }, include: [{ model: UserModel, as: 'author', attributes: ['id', 'name'] }], order: [['id', 'ASC']],
  });
  return rows.map(toComment);
}

/** Add a comment and its activity event in one transaction. */
export async function addComment(projectId: number, variantId: number, userId: number, input: CommentCreate): Promise<Comment> {
  const id = await CommentModel.sequelize!.transaction(async (transaction) => {
    const c = await CommentModel.create({ variantId, authorId: userId, text: input.text, partId: input.partId ?? null }, { transaction });
    const excerpt = input.text.length > 80 ? `${input.text.slice(0, 77)}…` : input.text;
    const pin = input.partId ? ` on part ${input.partId}` : '';
    await recordActivity({ projectId, variantId, actorId: userId, kind: 'comment.created', summary: `commented${pin}: ${excerpt}` }, transaction);
    return c.id;
  });
  const c = await CommentModel.findByPk(id, { include: [{ model: UserModel, as: 'author', attributes: ['id', 'name'] }] });
  return toComment(c!);
}

/** The author of a comment (null when the account is gone). */
export async function commentAuthor(id: number): Promise<number | null> {
  return (await CommentModel.findByPk(id))?.authorId ?? null;
}

/** Delete a comment. */
export async function deleteComment(id: number): Promise<void> {
  await CommentModel.destroy({ where: { id } });
}
