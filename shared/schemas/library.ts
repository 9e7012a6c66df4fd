/** Workspace library: materials and part templates. */
import { z } from 'zod';
import { nameSchema } from './common';
import { partSchema } from './model';

export const materialKinds = ['handbook', 'common-practice', 'user'] as const;
/** Where a material's values come from. */
export const materialKindSchema = z.enum(materialKinds);

const pos = z.number().finite().gt(0);
const materialFields = z.object({
  name: nameSchema,
  kxy: pos.lte(5000),
  kz: pos.lte(5000),
  rho: pos.lte(30000),
  cp: pos.lte(10000),
  source: z.string().max(400),
  kind: materialKindSchema,
});
/** POST /api/workspaces/:wid/materials body (SI units: W/m·K, kg/m³, J/kg·K). */
export const materialCreateSchema = materialFields.extend({
  source: materialFields.shape.source.default(''),
  kind: materialKindSchema.default('user'),
});
export type MaterialCreate = z.infer<typeof materialCreateSchema>;

/** PATCH /api/materials/:id body. */
export const materialPatchSchema = materialFields
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'give at least one field to change');
export type MaterialPatch = z.infer<typeof materialPatchSchema>;

/** A material as listed. */
export const materialSchema = materialFields.extend({ id: z.number().int(), workspaceId: z.number().int() });
export type Material = z.infer<typeof materialSchema>;

/** The part itself, without placement (id, x, y are given when it is placed). */
export const partTemplateBodySchema = partSchema.omit({ id: true, x: true, y: true });

const partTemplateFields = z.object({ name: nameSchema, note: z.string().max(4000), part: partTemplateBodySchema });
/** POST /api/workspaces/:wid/part-templates body. */
export const partTemplateCreateSchema = partTemplateFields.extend({ note: z.string().max(4000).default('') });
export type PartTemplateCreate = z.infer<typeof partTemplateCreateSchema>;

/** PATCH /api/part-templates/:id body. */
export const partTemplatePatchSchema = partTemplateFields
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'give at least one field to change');
export type PartTemplatePatch = z.infer<typeof partTemplatePatchSchema>;

/** A part template as listed. */
export const partTemplateSchema = z.object({
  id: z.number().int(),
  workspaceId: z.number().int(),
  name: z.string(),
  note: z.string(),
  part: partTemplateBodySchema,
});
export type PartTemplate = z.infer<typeof partTemplateSchema>;
