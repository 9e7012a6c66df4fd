/** Request and response shapes of /api/auth. */
import { z } from 'zod';
import { emailSchema, nameSchema, passwordSchema } from './common';
import { roleSchema } from './roles';

/** POST /api/auth/login body. */
export const loginSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'required').max(200),
});
export type LoginInput = z.infer<typeof loginSchema>;

/** POST /api/auth/setup body: the first owner and their workspace. */
export const setupSchema = z.object({
  email: emailSchema,
  name: nameSchema,
  password: passwordSchema,
  workspaceName: nameSchema,
});
export type SetupInput = z.infer<typeof setupSchema>;

/** The signed-in user. */
export const userSchema = z.object({ id: z.number().int(), email: z.string(), name: z.string() });
export type User = z.infer<typeof userSchema>;

/** One workspace the user belongs to. */
export const membershipSummarySchema = z.object({
  workspaceId: z.number().int(),
  workspaceName: z.string(),
  role: roleSchema,
});
export type MembershipSummary = z.infer<typeof membershipSummarySchema>;

/** GET /api/auth/me response (also returned by login, setup and invitation accept, with a fresh csrfToken). */
export const meSchema = z.object({
  user: userSchema,
  memberships: z.array(membershipSummarySchema),
  csrfToken: z.string().optional(),
});
export type Me = z.infer<typeof meSchema>;

/** PATCH /api/auth/me body: the signed-in user's display name. */
export const profileSchema = z.object({ name: nameSchema });
export type ProfileInput = z.infer<typeof profileSchema>;

/** POST /api/auth/password body: the current password and the new one. */
export const passwordChangeSchema = z.object({
  currentPassword: z.string().min(1, 'required').max(200),
  newPassword: passwordSchema,
});
export type PasswordChangeInput = z.infer<typeof passwordChangeSchema>;
