/** Request and response shapes of invitations. */
import { z } from 'zod';
import { emailSchema, passwordSchema } from './common';
import { roleSchema } from './roles';

/** POST /api/workspaces/:wid/invitations body. */
export const invitationCreateSchema = z.object({ email: emailSchema, role: roleSchema });
export type InvitationCreate = z.infer<typeof invitationCreateSchema>;

/** POST /api/invitations/:token/accept body; a new account needs a name, an existing account gives its own password (name ignored). */
export const invitationAcceptSchema = z.object({
  name: z.string().trim().max(120).optional(),
  password: passwordSchema,
});
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>;

/** Invitation as the owner sees it. */
export const invitationSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  role: roleSchema,
  expiresAt: z.string(),
  usedAt: z.string().nullable(),
  createdAt: z.string(),
  invitedBy: z.string().nullable(),
  mailDelivered: z.boolean().optional(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** GET /api/invitations/:token (public) response. */
export const invitationPublicSchema = z.object({
  workspaceName: z.string(),
  email: z.string(),
  role: roleSchema,
  accountExists: z.boolean(),
});
export type InvitationPublic = z.infer<typeof invitationPublicSchema>;

/** A message kept by the local fake SMTP server. */
export const outboxMessageSchema = z.object({
  id: z.number().int(),
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  date: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
