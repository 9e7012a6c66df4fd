/** Workspaces and their members. */
import type { Member, Workspace } from '@shared/schemas/workspaces';
import type { Role } from '@shared/schemas/roles';
import { MembershipModel, UserModel, WorkspaceModel } from '../../db/models/accounts';

type WithWorkspace = MembershipModel & { workspace: WorkspaceModel };
type WithUser = MembershipModel & { user: UserModel };

/** Workspaces of a user with their role. */
export async function listForUser(userId: number): Promise<Workspace[]> {
  const rows = (await MembershipModel.findAll({
    where: { userId },
    include: [{ model: WorkspaceModel, as: 'workspace' }],
    order: [['workspaceId', 'ASC']],
  })) as WithWorkspace[];
  return rows.map((m) => ({ id: m.workspace.id, name: m.workspace.name, role: m.role, createdAt: m.workspace.createdAt.toISOString() }));
}

/** Create a workspace owned by `userId`. */
export async function createWorkspace(name: string, userId: number): Promise<Workspace> {
  return WorkspaceModel.sequelize!.transaction(async (transaction) => {
    const w = await WorkspaceModel.create({ name }, { transaction });
    await MembershipModel.create({ userId, workspaceId: w.id, role: 'owner' }, { transaction });
    return { id: w.id, name: w.name, role: 'owner' as const, createdAt: w.createdAt.toISOString() };
  });
}

/** Rename a workspace. */
export async function renameWorkspace(workspaceId: number, name: string): Promise<void> {
  await WorkspaceModel.update({ name }, { where: { id: workspaceId } });
}

/** One workspace seen with `role`. */
export async function findWorkspace(workspaceId: number, role: Role): Promise<Workspace | null> {
  const w = await WorkspaceModel.findByPk(workspaceId);
  return w ? { id: w.id, name: w.name, role, createdAt: w.createdAt.toISOString() } : null;
}

const toMember = (m: WithUser): Member => ({
  userId: m.userId, email: m.user.email, name: m.user.name, role: m.role, joinedAt: m.createdAt.toISOString(),
});

/** Members of a workspace, by name. */
export async function listMembers(workspaceId: number): Promise<Member[]> {
  const rows = (await MembershipModel.findAll({
    where: { workspaceId },
    include: [{ model: UserModel, as: 'user' }],
  })) as WithUser[];
  return rows.map(toMember).sort((a, b) => a.name.localeCompare(b.name));
}

/** Change a member's role unless that would leave the workspace without an owner; null when not a member. */
export async function changeRole(workspaceId: number, userId: number, role: Role): Promise<Member | 'last_owner' | null> {
  return MembershipModel.sequelize!.transaction(async (transaction) => {
    const m = (await MembershipModel.findOne({ where: { workspaceId, userId }, include: [{ model: UserModel, as: 'user' }], transaction })) as WithUser | null;
    if (!m) return null;
    if (m.role === 'owner' && role !== 'owner' && (await MembershipModel.count({ where: { workspaceId, role: 'owner' }, transaction })) <= 1) {
      return 'last_owner';
    }
    await m.update({ role }, { transaction });
    return toMember(m);
  });
}

/** Remove a member unless they are the last owner; false when not a member. */
export async function removeMember(workspaceId: number, userId: number): Promise<boolean | 'last_owner'> {
  return MembershipModel.sequelize!.transaction(async (transaction) => {
    const m = await MembershipModel.findOne({ where: { workspaceId, userId }, transaction });
    if (!m) return false;
    if (m.role === 'owner' && (await MembershipModel.count({ where: { workspaceId, role: 'owner' }, transaction })) <= 1) {
      return 'last_owner';
    }
    await m.destroy({ transaction });
    return true;
  });
}

/** E-mail addresses of the members with one of `roles`. */
export async function memberEmails(workspaceId: number, roles: Role[]): Promise<{ userId: number; email: string }[]> {
  const rows = (await MembershipModel.findAll({ where: { workspaceId, role: roles }, include: [{ model: UserModel, as: 'user' }] })) as WithUser[];
  return rows.map((m) => ({ userId: m.userId, email: m.user.email }));
}
