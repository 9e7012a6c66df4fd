/** Database access of import/export: a variant with its project and assembly names, and inserting an imported variant. */
import type { Model } from '@shared/schemas/model';
import type { ExportSource } from '@shared/export/units';
import { AssemblyModel, ProjectModel, VariantModel } from '../../db/models/designs';
import * as variants from '../variants/variantsRepository';

/** A stored variant's model and where it sits, named for export headers. */
export interface StoredVariant {
  id: number;
  assemblyId: number;
  model: Model;
  source: ExportSource;
}

/** Load a variant with its names; null when it is gone. */
export async function loadVariant(id: number): Promise<StoredVariant | null> {
  const v = await VariantModel.findByPk(id);
  if (!v) return null;
  const assembly = await AssemblyModel.findByPk(v.assemblyId);
  const project = assembly ? await ProjectModel.findByPk(assembly.projectId) : null;
  return {
    id: v.id,
    assemblyId: v.assemblyId,
    model: JSON.parse(v.model) as Model,
    source: { project: project?.name, assembly: assembly?.name, variant: v.name, version: v.version, status: v.status },
  };
}

/** The model a floorplan starts from: the given variant of the assembly, else its first one; null when none. */
export async function baseModel(assemblyId: number, variantId?: number): Promise<Model | null> {
  const v = variantId ? await VariantModel.findOne({ where: { id: variantId, assemblyId } }) : await variants.firstVariant(assemblyId);
  return v ? (JSON.parse(v.model) as Model) : null;
}

/** Insert an imported variant (version 1, history entry and activity event in one transaction); returns its id. */
export function insertImported(
  where: { assemblyId: number; projectId: number; userId: number }, data: { name: string; note: string; model: Model; summary: string },
): Promise<number> {
  return variants.inTransaction((t) =>
    variants.insertVariant(
      { assemblyId: where.assemblyId, name: data.name, note: data.note, model: data.model, userId: where.userId },
      { projectId: where.projectId, actorId: where.userId, kind: 'variant.created', summary: data.summary },
      t,
    ),
  );
}
