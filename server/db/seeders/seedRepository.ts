/** Database writes of the demo seed (all inside the caller's transaction). */
import type { Transaction } from 'sequelize';
import type { Role } from '@shared/schemas/roles';
import type { Model } from '@shared/schemas/model';
import type { MaterialCreate } from '@shared/schemas/library';
import { MembershipModel, UserModel, WorkspaceModel } from '../models/accounts';
import { AssemblyModel, ProjectModel, VariantModel, VariantVersionModel } from '../models/designs';
import { ActivityEventModel, MaterialModel } from '../models/records';
import type { Named } from './demoContent';

/** Number of users. */
export function countUsers(transaction?: Transaction): Promise<number> {
  return UserModel.count({ transaction });
}

/** Run `fn` in one transaction. */
export function inTransaction<T>(fn: (t: Transaction) => Promise<T>): Promise<T> {
  return UserModel.sequelize!.transaction(fn);
}

/** Create a workspace; returns its id. */
export async function createWorkspace(name: string, transaction: Transaction): Promise<number> {
  return (await WorkspaceModel.create({ name }, { transaction })).id;
}

/** Create a user and their membership; returns the user id. */
export async function createMember(
  user: { email: string; name: string; passwordHash: string }, workspaceId: number, role: Role, transaction: Transaction,
): Promise<number> {
  const u = await UserModel.create(user, { transaction });
  await MembershipModel.create({ userId: u.id, workspaceId, role }, { transaction });
  return u.id;
}

/** Create a project with its "created" activity event; returns its id. */
export async function createProject(workspaceId: number, p: Named, userId: number, transaction: Transaction): Promise<number> {
  const project = await ProjectModel.create({ workspaceId, name: p.name, description: p.description, createdById: userId }, { transaction });
  await ActivityEventModel.create(
    { projectId: project.id, variantId: null, actorId: userId, kind: 'project.created', summary: `created project "${p.name}"` },
    { transaction },
  );
  return project.id;
}

/** Create an assembly; returns its id. */
export async function createAssembly(projectId: number, a: Named, transaction: Transaction): Promise<number> {
  return (await AssemblyModel.create({ projectId, name: a.name, description: a.description }, { transaction })).id;
}

/** Create a variant at version 1 with its history row and activity event. */
export async function createVariant(
  projectId: number, assemblyId: number, v: { name: string; note: string; model: Model }, userId: number, transaction: Transaction,
): Promise<void> {
  const model = JSON.stringify(v.model);
  const variant = await VariantModel.create(
    { assemblyId, name: v.name, note: v.note, status: 'draft', model, version: 1, updatedById: userId },
    { transaction },
  );
  await VariantVersionModel.create({ variantId: variant.id, version: 1, model, summary: 'created', savedById: userId }, { transaction });
  await ActivityEventModel.create(
    { projectId, variantId: variant.id, actorId: userId, kind: 'variant.created', summary: `created variant "${v.name}"` },
    { transaction },
  );
}

/** Create a library material. */
export async function createMaterial(workspaceId: number, m: MaterialCreate, transaction: Transaction): Promise<void> {
  await MaterialModel.create({ workspaceId, ...m }, { transaction });
}
