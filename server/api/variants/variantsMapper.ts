/** Row → API shape for variants and their versions. */
import type { Model } from '@shared/schemas/model';
import type { VariantDetail, VariantSummary, VariantVersion } from '@shared/schemas/variants';
import type { VariantModel, VariantVersionModel } from '../../db/models/designs';

/** Summary (no model) of a variant row. */
export function toSummary(v: VariantModel): VariantSummary {
  return {
    id: v.id, assemblyId: v.assemblyId, name: v.name, note: v.note, status: v.status, version: v.version,
    createdAt: v.createdAt.toISOString(), updatedAt: v.updatedAt.toISOString(), updatedBy: v.updatedBy?.name ?? null,
  };
}

/** Full variant with its model and where it sits. */
export function toDetail(v: VariantModel, where: { projectId: number; workspaceId: number }): VariantDetail {
  return { ...toSummary(v), model: JSON.parse(v.model) as Model, ...where };
}

/** One history entry. */
export function toVersion(h: VariantVersionModel): VariantVersion {
  return { version: h.version, createdAt: h.createdAt.toISOString(), userId: h.savedById, userName: h.savedBy?.name ?? null, summary: h.summary };
}
