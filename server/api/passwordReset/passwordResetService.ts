/** Self-service password reset: e-mail a single-use link, look it up, set the new password and end every session. */
import type { PasswordResetInput, PasswordResetPublic } from '@shared/schemas/passwordReset';
import type { AppContext } from '../../lib/context';
import { randomToken, sha256 } from '../../lib/tokens';
import { hashPassword } from '../../lib/password';
import { AppError } from '../../lib/errors';
import * as authRepo from '../auth/authRepository';
import * as repo from './passwordResetRepository';
import { passwordResetMail } from './passwordResetMail';

/** How long a reset link stays valid. */
export const RESET_TTL_MS = 3600 * 1000;

/** Least time between two reset mails to one person, whoever asks and from wherever (the rate limit is per client address). */
export const RESET_COOLDOWN_MS = 60 * 1000;

/** 404 for a link that is unknown, used, replaced by a newer one or expired (one answer for all). */
export const linkGone = (): AppError => new AppError(404, 'not_found', 'This reset link is unknown, used or expired. Ask for a new one.');

/**
 * Mail a reset link when an account uses `email`; nothing otherwise. The link's mail is personal: it
 * carries no workspace, so no workspace Outbox lists it. The caller answers the same either way.
 */
export async function requestReset(ctx: AppContext, email: string): Promise<void> {
  const user = await authRepo.findUserByEmail(email);
  if (!user) return;
  const last = await repo.newestOpenAt(user.id);
  if (last && Date.now() - last.getTime() < RESET_COOLDOWN_MS) return;
  const token = randomToken();
  const expiresAt = new Date(Date.now() + RESET_TTL_MS);
  await repo.createReset({ userId: user.id, tokenHash: sha256(token), expiresAt });
  const mail = passwordResetMail({ email: user.email, link: `${ctx.config.publicUrl}/reset/${token}`, expiresAt });
  const delivered = await ctx.mailer.send({ to: user.email, ...mail });
  if (delivered && !ctx.config.smtp) {
    ctx.logger.info(`Password-reset mail for ${user.email} kept by the local mail server; read it with: npm run -s cli -- mail --to ${user.email}`);
  }
}

/** Whose password an open link sets; 404 when unknown, used or expired. */
export async function lookup(token: string): Promise<PasswordResetPublic> {
  const open = await repo.findOpen(sha256(token), new Date());
  if (!open) throw linkGone();
  return { email: open.email };
}

/** Set the new password (the link is used exactly once) and end every session of that user. */
export async function reset(ctx: AppContext, token: string, input: PasswordResetInput): Promise<void> {
  const tokenHash = sha256(token);
  if (!(await repo.findOpen(tokenHash, new Date()))) throw linkGone();
  const passwordHash = await hashPassword(input.password, ctx.config.argon2);
  const userId = await authRepo.inTransaction(async (t) => {
    const open = await repo.findOpen(tokenHash, new Date(), t);
    if (!open || !(await repo.markUsed(open.id, new Date(), t))) throw linkGone();
    await repo.setPasswordHash(open.userId, passwordHash, t);
    return open.userId;
  });
  await ctx.endOtherSessions(userId, '');
}
