/** Comments and activity events. */
import { z } from 'zod';

/** POST /api/variants/:vid/comments body; partId pins the comment to a part of the layout. */
export const commentCreateSchema = z.object({
  text: z.string().trim().min(1, 'required').max(4000),
  partId: z.string().min(1).max(40).optional(),
});
export type CommentCreate = z.infer<typeof commentCreateSchema>;

/** A comment as listed. */
export const commentSchema = z.object({
  id: z.number().int(),
  variantId: z.number().int(),
  userId: z.number().int().nullable(),
  userName: z.string().nullable(),
  text: z.string(),
  partId: z.string().nullable(),
  createdAt: z.string(),
});
export type Comment = z.infer<typeof commentSchema>;

export const activityKinds = [
  'project.created', 'assembly.created', 'variant.created', 'variant.saved', 'variant.copied',
  'variant.restored', 'variant.deleted', 'variant.status', 'comment.created', 'analysis.stored',
] as const;
/** Kind of an activity event. */
export const activityKindSchema = z.enum(activityKinds);
export type ActivityKind = z.infer<typeof activityKindSchema>;

/** One event of a project's activity trail. */
export const activityEventSchema = z.object({
  id: z.number().int(),
  projectId: z.number().int(),
  variantId: z.number().int().nullable(),
  kind: activityKindSchema,
  userId: z.number().int().nullable(),
  userName: z.string().nullable(),
  summary: z.string(),
  createdAt: z.string(),
});
export type ActivityEvent = z.infer<typeof activityEventSchema>;
