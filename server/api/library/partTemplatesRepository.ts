/** Part templates of a workspace library (the part stored as JSON text). */
import type { PartTemplate, PartTemplateCreate, PartTemplatePatch } from '@shared/schemas/library';
import { PartTemplateModel } from '../../db/models/records';

const toTemplate = (t: PartTemplateModel): PartTemplate => ({
  id: t.id, workspaceId: t.workspaceId, name: t.name, note: t.note, part: JSON.parse(t.part) as PartTemplate['part'],
});

/** Part templates of a workspace, by name. */
export async function listPartTemplates(workspaceId: number): Promise<PartTemplate[]> {
  return (await PartTemplateModel.findAll({ where: { workspaceId }, order: [['name', 'ASC']] })).map(toTemplate);
}

/** Add a part template. */
export async function createPartTemplate(workspaceId: number, input: PartTemplateCreate): Promise<PartTemplate> {
  return toTemplate(await PartTemplateModel.create({ workspaceId, name: input.name, note: input.note, part: JSON.stringify(input.part) }));
}

/** Change a part template; null when it does not exist. */
export async function updatePartTemplate(id: number, patch: PartTemplatePatch): Promise<PartTemplate | null> {
  const t = await PartTemplateModel.findByPk(id);
  if (!t) return null;
  await t.update({
    ...(patch.name !== undefined ? { name: patch.name } : {}),
    ...(patch.note !== undefined ? { note: patch.note } : {}),
    ...(patch.part !== undefined ? { part: JSON.stringify(patch.part) } : {}),
  });
  return toTemplate(t);
}

/** Delete a part template. */
export async function deletePartTemplate(id: number): Promise<void> {
  await PartTemplateModel.destroy({ where: { id } });
}
