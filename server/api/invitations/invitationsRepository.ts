/** Invitations: stored with the SHA-256 of their token, single use, with an expiry. */
import { Op, type Transaction } from 'sequelize';
import type { Invitation } from '@shared/schemas/invitations';
import type { Role } from '@shared/schemas/roles';
import { InvitationModel, MembershipModel, UserModel, WorkspaceModel } from '../../db/models/accounts';

type WithInviter = InvitationModel & { invitedBy?: UserModel | null };

const toInvitation = (i: WithInviter): Invitation => ({
  id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt.toISOString(), usedAt: i.usedAt?.toISOString() ?? null,
  createdAt: i.createdAt.toISOString(), invitedBy: i.invitedBy?.name ?? null,
});

/** True when a user with this e-mail is already a member. */
export async function isMember(workspaceId: number, email: string): Promise<boolean> {
  const user = await UserModel.findOne({ where: { email } });
  return user ? (await MembershipModel.count({ where: { workspaceId, userId: user.id } })) > 0 : false;
}

/** Name of a workspace ('' when gone). */
export async function workspaceName(workspaceId: number): Promise<string> {
  return (await WorkspaceModel.findByPk(workspaceId))?.name ?? '';
}

/** Create an invitation, replacing unused ones for the same address. */
export async function createInvitation(data: {
  workspaceId: number; email: string; role: Role; tokenHash: string; expiresAt: Date; invitedById: number;
}): Promise<Invitation> {
  return InvitationModel.sequelize!.transaction(async (transaction) => {
    await InvitationModel.destroy({ where: { workspaceId: data.workspaceId, email: data.email, usedAt: null }, transaction });
    const i = await InvitationModel.create({ ...data, usedAt: null }, { transaction });
    const inviter = await UserModel.findByPk(data.invitedById, { transaction });
    return toInvitation(Object.assign(i, { invitedBy: inviter }));
  });
}

/** A workspace's invitations, newest first. */
export async function listInvitations(workspaceId: number): Promise<Invitation[]> {
  const rows = (await InvitationModel.findAll({
    where: { workspaceId },
    include: [{ model: UserModel, as: 'invitedBy', attributes: ['id', 'name'] }],
    order: [['id', 'DESC']],
  })) as WithInviter[];
  return rows.map(toInvitation);
}

/** Delete an invitation of this workspace; false when there is none with that id. */
export async function deleteInvitation(workspaceId: number, id: number): Promise<boolean> {
  return (await InvitationModel.destroy({ where: { id, workspaceId } })) > 0;
}

/** The open (unused, unexpired) invitation with this token hash, with its workspace name. */
export async function findOpen(tokenHash: string, now: Date, transaction?: Transaction): Promise<{ invitation: InvitationModel; workspaceName: string } | null> {
  const i = await InvitationModel.findOne({ where: { tokenHash, usedAt: null, expiresAt: { [Op.gt]: now } }, transaction });
  if (!i) return null;
  const w = await WorkspaceModel.findByPk(i.workspaceId, { transaction });
  return w ? { invitation: i, workspaceName: w.name } : null;
}

/** Mark used, only if still unused (single use under concurrency); true when this call used it. */
export async function markUsed(id: number, now: Date, transaction: Transaction): Promise<boolean> {
  const [n] = await InvitationModel.update({ usedAt: now }, { where: { id, usedAt: null }, transaction });
  return n === 1;
}
