/** Variants (placement + stack-up + scenarios as one model document), their history and review status. */
import { z } from 'zod';
import { nameSchema, noteSchema } from './common';
import { modelSchema } from './model';
import type { Capability } from './roles';

export const variantStatuses = ['draft', 'in_review', 'approved', 'changes_requested'] as const;
/** Review status of a variant. */
export const variantStatusSchema = z.enum(variantStatuses);
export type VariantStatus = z.infer<typeof variantStatusSchema>;

/**
 * Review status moves, enforced by the server and offered by the client: target status → the
 * statuses it may come from and the capability it needs (shared/schemas/roles.ts).
 */
export const statusTransitions: Record<VariantStatus, { from: readonly VariantStatus[]; needs: Capability }> = {
  in_review: { from: ['draft', 'changes_requested'], needs: 'review.request' },
  draft: { from: ['in_review', 'changes_requested', 'approved'], needs: 'review.request' },
  approved: { from: ['in_review'], needs: 'review.decide' },
  changes_requested: { from: ['in_review'], needs: 'review.decide' },
};

/** POST /api/assemblies/:aid/variants body; without a model the server starts from the assembly's first variant or a blank template. */
export const variantCreateSchema = z.object({ name: nameSchema, note: noteSchema, model: modelSchema.optional() });
export type VariantCreate = z.infer<typeof variantCreateSchema>;

/** PUT /api/variants/:vid body: the whole model plus the version it was based on. */
export const variantSaveSchema = z.object({
  model: modelSchema,
  version: z.number().int().min(1),
  name: nameSchema.optional(),
  note: z.string().max(4000).optional(),
});
export type VariantSave = z.infer<typeof variantSaveSchema>;

/** POST /api/variants/:vid/copy body. */
export const variantCopySchema = z.object({ name: nameSchema, note: noteSchema });
export type VariantCopy = z.infer<typeof variantCopySchema>;

/** PATCH /api/variants/:vid/status body. */
export const variantStatusChangeSchema = z.object({ status: variantStatusSchema, message: z.string().max(2000).optional() });
export type VariantStatusChange = z.infer<typeof variantStatusChangeSchema>;

/** A variant in lists (no model). */
export const variantSummarySchema = z.object({
  id: z.number().int(),
  assemblyId: z.number().int(),
  name: z.string(),
  note: z.string(),
  status: variantStatusSchema,
  version: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  updatedBy: z.string().nullable(),
});
export type VariantSummary = z.infer<typeof variantSummarySchema>;

/** GET /api/variants/:vid response: summary + model + where it sits. */
export const variantDetailSchema = variantSummarySchema.extend({
  model: modelSchema,
  projectId: z.number().int(),
  workspaceId: z.number().int(),
});
export type VariantDetail = z.infer<typeof variantDetailSchema>;

/** One saved version in a variant's history. */
export const variantVersionSchema = z.object({
  version: z.number().int(),
  createdAt: z.string(),
  userId: z.number().int().nullable(),
  userName: z.string().nullable(),
  summary: z.string(),
});
export type VariantVersion = z.infer<typeof variantVersionSchema>;

/** POST /api/variants/:vid/versions/:n/restore body: optionally the version the client holds, for the optimistic check. */
export const variantRestoreSchema = z.object({ version: z.number().int().min(1).optional() });
export type VariantRestore = z.infer<typeof variantRestoreSchema>;
