/** Look-ups for authorisation: which workspace a record belongs to and the user's role there, in one query. */
import { QueryTypes } from 'sequelize';
import type { Role } from '@shared/schemas/roles';
import { ProjectModel } from '../../db/models/designs';

/** Where a record sits: its workspace and, for design records, its project. */
export interface Location {
  workspaceId: number;
  projectId?: number;
  assemblyId?: number;
  variantId?: number;
  recordId?: number;
}

/** Kinds of record a route acts on. */
export type Target = 'workspace' | 'project' | 'assembly' | 'variant' | 'comment' | 'material' | 'partTemplate';

/** Per kind: the query giving its location (one `?`: the record id). */
const locations: Record<Target, string> = {
  workspace: 'SELECT id AS workspaceId FROM workspaces WHERE id = ?',
  project: 'SELECT workspace_id AS workspaceId, id AS projectId FROM projects WHERE id = ?',
  assembly: `SELECT p.workspace_id AS workspaceId, p.id AS projectId, a.id AS assemblyId
     FROM assemblies a JOIN projects p ON p.id = a.project_id WHERE a.id = ?`,
  variant: `SELECT p.workspace_id AS workspaceId, p.id AS projectId, a.id AS assemblyId, v.id AS variantId
     FROM variants v JOIN assemblies a ON a.id = v.assembly_id JOIN projects p ON p.id = a.project_id WHERE v.id = ?`,
  comment: `SELECT p.workspace_id AS workspaceId, p.id AS projectId, a.id AS assemblyId, v.id AS variantId, c.id AS recordId
     FROM comments c JOIN variants v ON v.id = c.variant_id JOIN assemblies a ON a.id = v.assembly_id
     JOIN projects p ON p.id = a.project_id WHERE c.id = ?`,
  material: 'SELECT workspace_id AS workspaceId, id AS recordId FROM materials WHERE id = ?',
  partTemplate: 'SELECT workspace_id AS workspaceId, id AS recordId FROM part_templates WHERE id = ?',
};

/**
 * Where record `id` of kind `target` sits and `userId`'s role in its workspace (null when not a member);
 * null when there is no such record.
 */
export async function locateWithRole(target: Target, id: number, userId: number): Promise<{ location: Location; role: Role | null } | null> {
  const rows = await ProjectModel.sequelize!.query<Location & { role: Role | null }>(
    `SELECT l.*, m.role AS role FROM (${locations[target]}) l
     LEFT JOIN memberships m ON m.workspace_id = l.workspaceId AND m.user_id = ?`,
    { replacements: [id, userId], type: QueryTypes.SELECT },
  );
  const row = rows[0];
  if (!row) return null;
  const { role, ...location } = row;
  for (const k of Object.keys(location) as (keyof Location)[]) if (location[k] === null) delete location[k];
  return { location, role };
}
