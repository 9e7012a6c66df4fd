/** Users and memberships as the auth feature needs them. */
import type { Transaction } from 'sequelize';
import type { Role } from '@shared/schemas/roles';
import type { MembershipSummary, User } from '@shared/schemas/auth';
import { MembershipModel, UserModel, WorkspaceModel } from '../../db/models/accounts';

/** Number of accounts (0 = first start, setup needed). */
export function countUsers(): Promise<number> {
  return UserModel.count();
}

/** A user with their password hash, by e-mail. */
export function findUserByEmail(email: string, transaction?: Transaction): Promise<UserModel | null> {
  return UserModel.findOne({ where: { email }, transaction });
}

/** A user's public fields by id. */
export async function findUser(id: number): Promise<User | null> {
  const u = await UserModel.findByPk(id);
  return u ? { id: u.id, email: u.email, name: u.name } : null;
}

/** Create a user. */
export async function createUser(data: { email: string; name: string; passwordHash: string }, transaction: Transaction): Promise<User> {
  const u = await UserModel.create(data, { transaction });
  return { id: u.id, email: u.email, name: u.name };
}

/** Create a workspace and make `userId` its owner. */
export async function createWorkspaceWithOwner(name: string, userId: number, transaction: Transaction): Promise<number> {
  const ws = await WorkspaceModel.create({ name }, { transaction });
  await MembershipModel.create({ userId, workspaceId: ws.id, role: 'owner' }, { transaction });
  return ws.id;
}

/** Add (or change) a membership. */
export async function upsertMembership(userId: number, workspaceId: number, role: Role, transaction: Transaction): Promise<void> {
  const existing = await MembershipModel.findOne({ where: { userId, workspaceId }, transaction });
  if (existing) await existing.update({ role }, { transaction });
  else await MembershipModel.create({ userId, workspaceId, role }, { transaction });
}

/** The workspaces a user belongs to, with role. */
export async function listMemberships(userId: number): Promise<MembershipSummary[]> {
  const rows = await MembershipModel.findAll({
    where: { userId },
    include: [{ model: WorkspaceModel, as: 'workspace' }],
    order: [['workspaceId', 'ASC']],
  });
  return rows.map((m) => ({
    workspaceId: m.workspaceId,
    workspaceName: (m as MembershipModel & { workspace: WorkspaceModel }).workspace.name,
    role: m.role,
  }));
}

/** Run `fn` in one database transaction. */
export function inTransaction<T>(fn: (t: Transaction) => Promise<T>): Promise<T> {
  return UserModel.sequelize!.transaction(fn);
}

/** A user's password hash by id. */
export async function findPasswordHash(id: number): Promise<string | null> {
  return (await UserModel.findByPk(id))?.passwordHash ?? null;
}

/** Change a user's name and/or password hash. */
export async function updateUser(id: number, fields: { name?: string; passwordHash?: string }): Promise<void> {
  await UserModel.update(fields, { where: { id } });
}
