/** Projects of a workspace. */
import type { Project, ProjectCreate, ProjectPatch } from '@shared/schemas/projects';
import { ProjectModel } from '../../db/models/designs';
import { recordActivity } from '../activity/activityRepository';

const toProject = (p: ProjectModel): Project => ({
  id: p.id, workspaceId: p.workspaceId, name: p.name, description: p.description,
  createdAt: p.createdAt.toISOString(), updatedAt: p.updatedAt.toISOString(),
});

/** Projects of a workspace, most recently changed first. */
export async function listProjects(workspaceId: number): Promise<Project[]> {
  return (await ProjectModel.findAll({ where: { workspaceId }, order: [['updatedAt', 'DESC'], ['id', 'DESC']] })).map(toProject);
}

/** One project. */
export async function getProject(id: number): Promise<Project | null> {
  const p = await ProjectModel.findByPk(id);
  return p ? toProject(p) : null;
}

/** Create a project and its activity event in one transaction. */
export async function createProject(workspaceId: number, input: ProjectCreate, userId: number): Promise<Project> {
  return ProjectModel.sequelize!.transaction(async (transaction) => {
    const p = await ProjectModel.create({ workspaceId, name: input.name, description: input.description, createdById: userId }, { transaction });
    await recordActivity({ projectId: p.id, actorId: userId, kind: 'project.created', summary: `created project "${p.name}"` }, transaction);
    return toProject(p);
  });
}

/** Rename / re-describe a project. */
export async function updateProject(id: number, patch: ProjectPatch): Promise<Project | null> {
  const p = await ProjectModel.findByPk(id);
  if (!p) return null;
  await p.update(patch);
  return toProject(p);
}

/** Delete a project with everything in it (foreign keys cascade). */
export async function deleteProject(id: number): Promise<boolean> {
  return (await ProjectModel.destroy({ where: { id } })) > 0;
}
