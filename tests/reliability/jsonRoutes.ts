/** Every JSON-body route with a valid body to mutate (ids from the demo fixture); the fuzz test walks this list. */
import type { Fixture } from '../server/helpers/fixtures';
import { templatePart } from '../server/helpers/fixtures';

/** One route: method, a concrete path, and a valid body. */
export interface JsonRoute {
  route: string;
  method: 'post' | 'put' | 'patch';
  path: string;
  valid: unknown;
}

const channel = {
  footprint: { x: 0.01, y: 0.01 },
  above: { layers: [{ thickness: 5e-4, k: 150 }], h: 5000 },
  below: { layers: [], h: 0 },
  sources: [{ x: 0.005, y: 0.005, width: 0.002, height: 0.002, power: 1 }],
};

/** Build the list against the fixture's records (one fresh variant for the variant routes). */
export async function jsonRoutes(f: Fixture): Promise<JsonRoute[]> {
  const vid = await f.freshVariant();
  const v = (await f.owner.get(`/api/variants/${vid}`)).body;
  const member = await f.freshMember();
  const material = await f.freshMaterial();
  const template = await f.freshPartTemplate();
  return [
    { route: 'PATCH /auth/me', method: 'patch', path: '/api/auth/me', valid: { name: 'Ada Quillfeather' } },
    { route: 'POST /auth/password', method: 'post', path: '/api/auth/password', valid: { currentPassword: 'wrong-password-1', newPassword: 'another-password-2' } },
    { route: 'POST /auth/setup', method: 'post', path: '/api/auth/setup', valid: { email: 'x@larkspur.example', name: 'X', password: 'long-enough-pass', workspaceName: 'W' } },
    { route: 'POST /workspaces', method: 'post', path: '/api/workspaces', valid: { name: 'Side team' } },
    { route: 'PATCH /workspaces/:wid', method: 'patch', path: `/api/workspaces/${f.wid}`, valid: { name: 'Larkspur Compute (demo)' } },
    { route: 'PATCH /workspaces/:wid/members/:uid', method: 'patch', path: `/api/workspaces/${f.wid}/members/${member}`, valid: { role: 'reviewer' } },
    { route: 'POST /workspaces/:wid/invitations', method: 'post', path: `/api/workspaces/${f.wid}/invitations`, valid: { email: 'fuzz@larkspur.example', role: 'engineer' } },
    { route: 'POST /invitations/:token/accept', method: 'post', path: '/api/invitations/not-a-real-token/accept', valid: { name: 'New Person', password: 'long-enough-pass' } },
    { route: 'POST /workspaces/:wid/projects', method: 'post', path: `/api/workspaces/${f.wid}/projects`, valid: { name: 'P' } },
    { route: 'PATCH /projects/:pid', method: 'patch', path: `/api/projects/${f.pid}`, valid: { description: 'd' } },
    { route: 'POST /projects/:pid/assemblies', method: 'post', path: `/api/projects/${f.pid}/assemblies`, valid: { name: 'A' } },
    { route: 'PATCH /assemblies/:aid', method: 'patch', path: `/api/assemblies/${f.aid}`, valid: { name: 'A' } },
    { route: 'POST /assemblies/:aid/variants', method: 'post', path: `/api/assemblies/${f.aid}/variants`, valid: { name: 'V' } },
    { route: 'PUT /variants/:vid', method: 'put', path: `/api/variants/${vid}`, valid: { model: v.model, version: v.version } },
    { route: 'POST /variants/:vid/copy', method: 'post', path: `/api/variants/${vid}/copy`, valid: { name: 'C' } },
    { route: 'POST /variants/:vid/versions/:n/restore', method: 'post', path: `/api/variants/${vid}/versions/1/restore`, valid: { version: 0 } },
    { route: 'PATCH /variants/:vid/status', method: 'patch', path: `/api/variants/${vid}/status`, valid: { status: 'approved' } },
    { route: 'POST /variants/:vid/comments', method: 'post', path: `/api/variants/${vid}/comments`, valid: { text: 'Warm corner.', partId: 'cpu0' } },
    { route: 'POST /workspaces/:wid/materials', method: 'post', path: `/api/workspaces/${f.wid}/materials`, valid: { name: 'M', kxy: 1, kz: 1, rho: 1000, cp: 1000 } },
    { route: 'PATCH /materials/:id', method: 'patch', path: `/api/materials/${material}`, valid: { source: 's' } },
    { route: 'POST /workspaces/:wid/part-templates', method: 'post', path: `/api/workspaces/${f.wid}/part-templates`, valid: { name: 'T', part: templatePart } },
    { route: 'PATCH /part-templates/:id', method: 'patch', path: `/api/part-templates/${template}`, valid: { note: 'n' } },
    { route: 'POST /assemblies/:aid/import', method: 'post', path: `/api/assemblies/${f.aid}/import`, valid: { name: 'I', model: v.model } },
    { route: 'POST /assemblies/:aid/import/floorplan', method: 'post', path: `/api/assemblies/${f.aid}/import/floorplan`, valid: { name: 'F', csv: 'id,x,y\n' } },
    { route: 'POST /import/floorplan/preview', method: 'post', path: '/api/import/floorplan/preview', valid: { csv: 'id,x,y\n' } },
    { route: 'POST /import/power-map', method: 'post', path: '/api/import/power-map', valid: { csv: '1,2\n3,4\n' } },
    { route: 'POST /solve/channel', method: 'post', path: '/api/solve/channel', valid: channel },
    { route: 'POST /variants/:vid/solve', method: 'post', path: `/api/variants/${vid}/solve`, valid: { scenarioId: 'nope' } },
    { route: 'POST /variants/:vid/jobs', method: 'post', path: `/api/variants/${vid}/jobs`, valid: { kind: 'impedance', count: 5 } },
    { route: 'POST /auth/password-reset', method: 'post', path: '/api/auth/password-reset', valid: { email: 'no.account@larkspur.example' } },
    { route: 'POST /auth/password-reset/:token', method: 'post', path: '/api/auth/password-reset/not-a-real-token-at-all', valid: { password: 'long-enough-pass' } },
  ];
}
