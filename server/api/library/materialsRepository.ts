/** Materials of a workspace library. */
import type { Material, MaterialCreate, MaterialPatch } from '@shared/schemas/library';
import { MaterialModel } from '../../db/models/records';

const toMaterial = (m: MaterialModel): Material => ({
  id: m.id, workspaceId: m.workspaceId, name: m.name, kxy: m.kxy, kz: m.kz, rho: m.rho, cp: m.cp, source: m.source,
  kind: m.kind as Material['kind'],
});

/** Materials of a workspace, by name. */
export async function listMaterials(workspaceId: number): Promise<Material[]> {
  return (await MaterialModel.findAll({ where: { workspaceId }, order: [['name', 'ASC']] })).map(toMaterial);
}

/** Add a material. */
export async function createMaterial(workspaceId: number, input: MaterialCreate): Promise<Material> {
  return toMaterial(await MaterialModel.create({ workspaceId, ...input }));
}

/** Change a material; null when it does not exist. */
export async function updateMaterial(id: number, patch: MaterialPatch): Promise<Material | null> {
  const m = await MaterialModel.findByPk(id);
  if (!m) return null;
  await m.update(patch);
  return toMaterial(m);
}

/** Delete a material. */
export async function deleteMaterial(id: number): Promise<void> {
  await MaterialModel.destroy({ where: { id } });
}
