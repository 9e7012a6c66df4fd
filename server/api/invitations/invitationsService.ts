/** Inviting by e-mail and accepting an invitation (new account, or membership for an existing one). */
import type { Invitation, InvitationAccept, InvitationCreate, InvitationPublic } from '@shared/schemas/invitations';
import type { AppContext } from '../../lib/context';
import { randomToken, sha256 } from '../../lib/tokens';
import { hashPassword, verifyPassword } from '../../lib/password';
import { ConflictError, NotFoundError, UnauthorizedError, ValidationError } from '../../lib/errors';
import * as authRepo from '../auth/authRepository';
import * as repo from './invitationsRepository';
import { invitationMail } from './invitationMail';

/** How long an invitation link stays valid. */
export const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000;

/** Create an invitation and e-mail its link; `mailDelivered` tells whether the relay accepted the mail. */
export async function invite(ctx: AppContext, workspaceId: number, inviterId: number, input: InvitationCreate): Promise<Invitation> {
  if (await repo.isMember(workspaceId, input.email)) {
    throw new ConflictError('already_member', `${input.email} is already a member of this workspace.`);
  }
  const token = randomToken();
  const expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
  const invitation = await repo.createInvitation({ workspaceId, email: input.email, role: input.role, tokenHash: sha256(token), expiresAt, invitedById: inviterId });
  const workspace = await repo.workspaceName(workspaceId);
  const link = `${ctx.config.publicUrl}/invite/${token}`;
  const mail = invitationMail({ inviter: invitation.invitedBy ?? 'A colleague', workspace, role: input.role, link, expiresAt });
  const mailDelivered = await ctx.mailer.send({ to: input.email, workspaceId, ...mail });
  return { ...invitation, mailDelivered };
}

/** Public view of an open invitation; 404 when unknown, used or expired. */
export async function lookup(token: string): Promise<InvitationPublic> {
  const open = await repo.findOpen(sha256(token), new Date());
  if (!open) throw new NotFoundError('Invitation');
  const existing = await authRepo.findUserByEmail(open.invitation.email);
  return { workspaceName: open.workspaceName, email: open.invitation.email, role: open.invitation.role, accountExists: !!existing };
}

/**
 * Accept: a new e-mail gets an account (name + password); an existing account must give its
 * own password. The invitation is used exactly once. Returns the user id to sign in.
 */
export async function accept(ctx: AppContext, token: string, input: InvitationAccept): Promise<number> {
  const tokenHash = sha256(token);
  const peek = await repo.findOpen(tokenHash, new Date());
  if (!peek) throw new NotFoundError('Invitation');
  const existing = await authRepo.findUserByEmail(peek.invitation.email);
  if (existing && !(await verifyPassword(existing.passwordHash, input.password))) {
    throw new UnauthorizedError('This e-mail already has an account: enter that account\'s password to join.', 'bad_credentials');
  }
  if (!existing && !input.name) throw new ValidationError([{ path: 'name', message: 'required' }]);
  const passwordHash = existing ? '' : await hashPassword(input.password, ctx.config.argon2);
  return authRepo.inTransaction(async (t) => {
    const open = await repo.findOpen(tokenHash, new Date(), t);
    if (!open || !(await repo.markUsed(open.invitation.id, new Date(), t))) throw new NotFoundError('Invitation');
    const user = await authRepo.findUserByEmail(open.invitation.email, t);
    if (user && !existing) throw new ConflictError('account_exists', 'An account for this e-mail was just created; sign in and open the link again.');
    const userId = user ? user.id : (await authRepo.createUser({ email: open.invitation.email, name: input.name!, passwordHash }, t)).id;
    await authRepo.upsertMembership(userId, open.invitation.workspaceId, open.invitation.role, t);
    return userId;
  });
}
