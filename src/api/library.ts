/** Workspace library: materials and part templates. */
import { http } from './http';
import type { Material, PartTemplate } from './types';

export const listMaterials = (wid: number) => http.get<Material[]>(`/api/workspaces/${wid}/materials`);
export const listPartTemplates = (wid: number) => http.get<PartTemplate[]>(`/api/workspaces/${wid}/part-templates`);
