/** Find and copy the seeded demo variant through the API (for the load and fault scripts). */
import type { HttpSession } from './httpSession';

/** The first variant of the first assembly of the first project of the session's first workspace. */
export async function demoVariantId(s: HttpSession): Promise<number> {
  const wid = (await s.request('GET', '/api/workspaces')).body[0].id;
  const pid = (await s.request('GET', `/api/workspaces/${wid}/projects`)).body[0].id;
  const aid = (await s.request('GET', `/api/projects/${pid}/assemblies`)).body[0].id;
  return (await s.request('GET', `/api/assemblies/${aid}/variants`)).body[0].id;
}

/** Copy variant `vid` under `name`; returns the new id. */
export async function copyVariant(s: HttpSession, vid: number, name: string): Promise<number> {
  const res = await s.request('POST', `/api/variants/${vid}/copy`, { name });
  if (res.status !== 201) throw new Error(`copy failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}
