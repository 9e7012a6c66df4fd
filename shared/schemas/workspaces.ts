/** Workspaces and their members. */
import { z } from 'zod';
import { roleSchema } from './roles';
import { nameSchema } from './common';

/** A workspace with the caller's role in it. */
export const workspaceSchema = z.object({ id: z.number().int(), name: z.string(), role: roleSchema, createdAt: z.string() });
export type Workspace = z.infer<typeof workspaceSchema>;

/** One member of a workspace. */
export const memberSchema = z.object({
  userId: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

/** PATCH /api/workspaces/:wid/members/:uid body. */
export const memberRoleSchema = z.object({ role: roleSchema });
export type MemberRoleInput = z.infer<typeof memberRoleSchema>;

/** POST /api/workspaces and PATCH /api/workspaces/:wid body. */
export const workspaceNameSchema = z.object({ name: nameSchema });
export type WorkspaceNameInput = z.infer<typeof workspaceNameSchema>;
