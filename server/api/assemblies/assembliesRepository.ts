/** Assemblies of a project. */
import type { Assembly, AssemblyCreate, AssemblyPatch } from '@shared/schemas/projects';
import { AssemblyModel } from '../../db/models/designs';
import { recordActivity } from '../activity/activityRepository';

const toAssembly = (a: AssemblyModel): Assembly => ({
  id: a.id, projectId: a.projectId, name: a.name, description: a.description,
  createdAt: a.createdAt.toISOString(), updatedAt: a.updatedAt.toISOString(),
});

/** Assemblies of a project, oldest first. */
export async function listAssemblies(projectId: number): Promise<Assembly[]> {
  return (await AssemblyModel.findAll({ where: { projectId }, order: [['id', 'ASC']] })).map(toAssembly);
}

/** One assembly. */
export async function getAssembly(id: number): Promise<Assembly | null> {
  const a = await AssemblyModel.findByPk(id);
  return a ? toAssembly(a) : null;
}

/** Create an assembly and its activity event in one transaction. */
export async function createAssembly(projectId: number, input: AssemblyCreate, userId: number): Promise<Assembly> {
  return AssemblyModel.sequelize!.transaction(async (transaction) => {
    const a = await AssemblyModel.create({ projectId, name: input.name, description: input.description }, { transaction });
    await recordActivity({ projectId, actorId: userId, kind: 'assembly.created', summary: `created assembly "${a.name}"` }, transaction);
    return toAssembly(a);
  });
}

/** Rename / re-describe an assembly. */
export async function updateAssembly(id: number, patch: AssemblyPatch): Promise<Assembly | null> {
  const a = await AssemblyModel.findByPk(id);
  if (!a) return null;
  await a.update(patch);
  return toAssembly(a);
}

/** Delete an assembly with its variants (foreign keys cascade). */
export async function deleteAssembly(id: number): Promise<boolean> {
  return (await AssemblyModel.destroy({ where: { id } })) > 0;
}
