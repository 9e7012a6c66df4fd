/** Request and response shapes of the self-service password reset (/api/auth/password-reset). */
import { z } from 'zod';
import { emailSchema, passwordSchema } from './common';

/** POST /api/auth/password-reset body: the address to send a reset link to. */
export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

/** POST /api/auth/password-reset/:token body: the new password (same rules as everywhere). */
export const passwordResetSchema = z.object({ password: passwordSchema });
export type PasswordResetInput = z.infer<typeof passwordResetSchema>;

/** GET /api/auth/password-reset/:token response: whose password the link sets. */
export const passwordResetPublicSchema = z.object({ email: z.string() });
export type PasswordResetPublic = z.infer<typeof passwordResetPublicSchema>;

/** The one answer to every reset request, whether or not an account uses the address (no account enumeration). */
export const PASSWORD_RESET_REQUESTED =
  'If an account uses this address, a link to choose a new password is on its way. The link works once, for one hour.';

/** 202 response of POST /api/auth/password-reset. */
export const passwordResetRequestedSchema = z.object({ message: z.string() });
export type PasswordResetRequested = z.infer<typeof passwordResetRequestedSchema>;
