/** Projects and assemblies. */
import { z } from 'zod';
import { nameSchema, noteSchema } from './common';

/** POST /api/workspaces/:wid/projects body. */
export const projectCreateSchema = z.object({ name: nameSchema, description: noteSchema });
export type ProjectCreate = z.infer<typeof projectCreateSchema>;

/** PATCH /api/projects/:pid body. */
export const projectPatchSchema = z
  .object({ name: nameSchema, description: z.string().max(4000) })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'give at least one field to change');
export type ProjectPatch = z.infer<typeof projectPatchSchema>;

/** A project as listed. */
export const projectSchema = z.object({
  id: z.number().int(),
  workspaceId: z.number().int(),
  name: z.string(),
  description: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Project = z.infer<typeof projectSchema>;

/** POST /api/projects/:pid/assemblies body. */
export const assemblyCreateSchema = z.object({ name: nameSchema, description: noteSchema });
export type AssemblyCreate = z.infer<typeof assemblyCreateSchema>;

/** PATCH /api/assemblies/:aid body. */
export const assemblyPatchSchema = projectPatchSchema;
export type AssemblyPatch = z.infer<typeof assemblyPatchSchema>;

/** An assembly as listed. */
export const assemblySchema = z.object({
  id: z.number().int(),
  projectId: z.number().int(),
  name: z.string(),
  description: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Assembly = z.infer<typeof assemblySchema>;
