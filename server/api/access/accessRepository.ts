/** Look-ups for authorisation: a user's role in a workspace, and which workspace a record belongs to. */
import { QueryTypes } from 'sequelize';
import type { Role } from '@shared/schemas/roles';
import { MembershipModel } from '../../db/models/accounts';
import { ProjectModel } from '../../db/models/designs';

/** Where a record sits: its workspace and, for design records, its project. */
export interface Location {
  workspaceId: number;
  projectId?: number;
  assemblyId?: number;
  variantId?: number;
  recordId?: number;
}

/** The user's role in the workspace, or null when not a member. */
export async function findRole(userId: number, workspaceId: number): Promise<Role | null> {
  const m = await MembershipModel.findOne({ where: { userId, workspaceId } });
  return m ? m.role : null;
}

/** Locate a project. */
export async function locateProject(projectId: number): Promise<Location | null> {
  const p = await ProjectModel.findByPk(projectId);
  return p ? { workspaceId: p.workspaceId, projectId: p.id } : null;
}

async function one(sql: string, id: number): Promise<Location | null> {
  const sequelize = ProjectModel.sequelize!;
  const rows = await sequelize.query<Location>(sql, { replacements: [id], type: QueryTypes.SELECT });
  return rows[0] ?? null;
}

/** Locate an assembly. */
export function locateAssembly(assemblyId: number): Promise<Location | null> {
  return one(
    `SELECT p.workspace_id AS workspaceId, p.id AS projectId, a.id AS assemblyId
     FROM assemblies a JOIN projects p ON p.id = a.project_id WHERE a.id = ?`,
    assemblyId,
  );
}

/** Locate a variant. */
export function locateVariant(variantId: number): Promise<Location | null> {
  return one(
    `SELECT p.workspace_id AS workspaceId, p.id AS projectId, a.id AS assemblyId, v.id AS variantId
     FROM variants v JOIN assemblies a ON a.id = v.assembly_id JOIN projects p ON p.id = a.project_id WHERE v.id = ?`,
    variantId,
  );
}

/** Locate a comment (recordId = comment id, variantId its variant). */
export function locateComment(commentId: number): Promise<Location | null> {
  return one(
    `SELECT p.workspace_id AS workspaceId, p.id AS projectId, a.id AS assemblyId, v.id AS variantId, c.id AS recordId
     FROM comments c JOIN variants v ON v.id = c.variant_id JOIN assemblies a ON a.id = v.assembly_id
     JOIN projects p ON p.id = a.project_id WHERE c.id = ?`,
    commentId,
  );
}

/** Locate a library material. */
export function locateMaterial(materialId: number): Promise<Location | null> {
  return one('SELECT workspace_id AS workspaceId, id AS recordId FROM materials WHERE id = ?', materialId);
}

/** Locate a part template. */
export function locatePartTemplate(templateId: number): Promise<Location | null> {
  return one('SELECT workspace_id AS workspaceId, id AS recordId FROM part_templates WHERE id = ?', templateId);
}

/** Locate a workspace (itself). */
export function locateWorkspace(workspaceId: number): Promise<Location | null> {
  return one('SELECT id AS workspaceId FROM workspaces WHERE id = ?', workspaceId);
}
