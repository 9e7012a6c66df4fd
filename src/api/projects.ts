/** Projects, assemblies and their activity trail. */
import { http } from './http';
import type { Assembly, Project } from './types';

export const listProjects = (wid: number) => http.get<Project[]>(`/api/workspaces/${wid}/projects`);
export const createProject = (wid: number, body: { name: string; description?: string }) =>
  http.post<Project>(`/api/workspaces/${wid}/projects`, body);
export const getProject = (pid: number) => http.get<Project>(`/api/projects/${pid}`);
export const listAssemblies = (pid: number) => http.get<Assembly[]>(`/api/projects/${pid}/assemblies`);
export const createAssembly = (pid: number, body: { name: string; description?: string }) =>
  http.post<Assembly>(`/api/projects/${pid}/assemblies`, body);
export const getAssembly = (aid: number) => http.get<Assembly>(`/api/assemblies/${aid}`);
