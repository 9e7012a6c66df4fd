/** Workspace library writes (owners and engineers): materials and part templates. Reads are in library.ts. */
import type { MaterialCreate, MaterialPatch, PartTemplateCreate, PartTemplatePatch } from '@shared/schemas/library';
import { http } from './http';
import type { Material, PartTemplate } from './types';

/** Add a material to a workspace's library. */
export const createMaterial = (wid: number, body: MaterialCreate) => http.post<Material>(`/api/workspaces/${wid}/materials`, body);
/** Change fields of a material. */
export const updateMaterial = (id: number, body: MaterialPatch) => http.patch<Material>(`/api/materials/${id}`, body);
/** Remove a material (variants keep the values they copied). */
export const deleteMaterial = (id: number) => http.del<void>(`/api/materials/${id}`);
/** Add a part template. */
export const createPartTemplate = (wid: number, body: PartTemplateCreate) => http.post<PartTemplate>(`/api/workspaces/${wid}/part-templates`, body);
/** Change a part template. */
export const updatePartTemplate = (id: number, body: PartTemplatePatch) => http.patch<PartTemplate>(`/api/part-templates/${id}`, body);
/** Remove a part template. */
export const deletePartTemplate = (id: number) => http.del<void>(`/api/part-templates/${id}`);
