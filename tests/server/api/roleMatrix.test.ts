/**
 * The role × route matrix: every route, every role (plus a member of another workspace and a
 * signed-out visitor), with the expected status. Expected values come from the permission
 * table in shared/schemas/roles.ts and the product brief (owner: all; engineer: design work;
 * reviewer: read, comment, decide). A member of another workspace always gets 404.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, signedIn, type TestApp } from '../helpers/testApp';
import { createUser, demoFixture, templatePart, type Fixture } from '../helpers/fixtures';

type Who = 'owner' | 'engineer' | 'reviewer' | 'outsider' | 'anon';
type Method = 'get' | 'post' | 'put' | 'patch' | 'del';

interface Case {
  method: Method;
  route: string;
  path: (f: Fixture) => Promise<string> | string;
  body?: (f: Fixture, path: string) => Promise<object> | object;
  /** Expected status for owner, engineer, reviewer; outsider → 404 and anon → 401 unless given. */
  expect: [number, number, number];
  outsider?: number;
  anon?: number;
}

const all: [number, number, number] = [200, 200, 200];
const design: [number, number, number] = [200, 200, 403];
const created: [number, number, number] = [201, 201, 403];
const ownerOnly: [number, number, number] = [200, 403, 403];
const gone: [number, number, number] = [204, 204, 403];

const channelBody = {
  footprint: { x: 0.01, y: 0.01 },
  above: { layers: [{ thickness: 5e-4, k: 150 }], h: 5000 },
  below: { layers: [], h: 0 },
  sources: [{ x: 0.005, y: 0.005, width: 0.002, height: 0.002, power: 1 }],
};

const currentVersion = async (f: Fixture, path: string) => (await f.owner.get(path)).body;

const cases: Case[] = [
  { method: 'get', route: 'GET /health', path: () => '/api/health', expect: all, outsider: 200, anon: 200 },
  { method: 'get', route: 'GET /auth/me', path: () => '/api/auth/me', expect: all, outsider: 200 },
  { method: 'get', route: 'GET /workspaces', path: () => '/api/workspaces', expect: all, outsider: 200 },
  { method: 'patch', route: 'PATCH /auth/me', path: () => '/api/auth/me', body: () => ({ name: 'Same Person' }), expect: all, outsider: 200 },
  { method: 'post', route: 'POST /workspaces', path: () => '/api/workspaces', body: () => ({ name: 'Side team' }), expect: [201, 201, 201], outsider: 201 },
  { method: 'get', route: 'GET /workspaces/:wid', path: (f) => `/api/workspaces/${f.wid}`, expect: all },
  { method: 'patch', route: 'PATCH /workspaces/:wid', path: (f) => `/api/workspaces/${f.wid}`, body: () => ({ name: 'Larkspur Compute (demo)' }), expect: ownerOnly },
  { method: 'get', route: 'GET /workspaces/:wid/members', path: (f) => `/api/workspaces/${f.wid}/members`, expect: all },
  { method: 'patch', route: 'PATCH /workspaces/:wid/members/:uid', path: async (f) => `/api/workspaces/${f.wid}/members/${await f.freshMember()}`, body: () => ({ role: 'engineer' }), expect: ownerOnly },
  { method: 'del', route: 'DELETE /workspaces/:wid/members/:uid', path: async (f) => `/api/workspaces/${f.wid}/members/${await f.freshMember()}`, expect: [204, 403, 403] },
  { method: 'post', route: 'POST /workspaces/:wid/invitations', path: (f) => `/api/workspaces/${f.wid}/invitations`, body: () => ({ email: `m${Math.random().toString(36).slice(2)}@larkspur.example`, role: 'engineer' }), expect: [201, 403, 403] },
  { method: 'get', route: 'GET /workspaces/:wid/invitations', path: (f) => `/api/workspaces/${f.wid}/invitations`, expect: ownerOnly },
  { method: 'del', route: 'DELETE /workspaces/:wid/invitations/:id', path: async (f) => `/api/workspaces/${f.wid}/invitations/${await f.freshInvitation()}`, expect: [204, 403, 403] },
  { method: 'get', route: 'GET /workspaces/:wid/outbox', path: (f) => `/api/workspaces/${f.wid}/outbox`, expect: ownerOnly },
  { method: 'get', route: 'GET /workspaces/:wid/projects', path: (f) => `/api/workspaces/${f.wid}/projects`, expect: all },
  { method: 'post', route: 'POST /workspaces/:wid/projects', path: (f) => `/api/workspaces/${f.wid}/projects`, body: () => ({ name: 'New project' }), expect: created },
  { method: 'get', route: 'GET /projects/:pid', path: (f) => `/api/projects/${f.pid}`, expect: all },
  { method: 'patch', route: 'PATCH /projects/:pid', path: async (f) => `/api/projects/${await f.freshProject()}`, body: () => ({ description: 'changed' }), expect: design },
  { method: 'del', route: 'DELETE /projects/:pid', path: async (f) => `/api/projects/${await f.freshProject()}`, expect: [204, 403, 403] },
  { method: 'get', route: 'GET /projects/:pid/activity', path: (f) => `/api/projects/${f.pid}/activity`, expect: all },
  { method: 'get', route: 'GET /projects/:pid/assemblies', path: (f) => `/api/projects/${f.pid}/assemblies`, expect: all },
  { method: 'post', route: 'POST /projects/:pid/assemblies', path: (f) => `/api/projects/${f.pid}/assemblies`, body: () => ({ name: 'New assembly' }), expect: created },
  { method: 'get', route: 'GET /assemblies/:aid', path: (f) => `/api/assemblies/${f.aid}`, expect: all },
  { method: 'patch', route: 'PATCH /assemblies/:aid', path: async (f) => `/api/assemblies/${await f.freshAssembly()}`, body: () => ({ name: 'Renamed' }), expect: design },
  { method: 'del', route: 'DELETE /assemblies/:aid', path: async (f) => `/api/assemblies/${await f.freshAssembly()}`, expect: gone },
  { method: 'get', route: 'GET /assemblies/:aid/variants', path: (f) => `/api/assemblies/${f.aid}/variants`, expect: all },
  { method: 'post', route: 'POST /assemblies/:aid/variants', path: (f) => `/api/assemblies/${f.aid}/variants`, body: () => ({ name: 'New variant' }), expect: created },
  { method: 'get', route: 'GET /variants/:vid', path: (f) => `/api/variants/${f.vid}`, expect: all },
  {
    method: 'put', route: 'PUT /variants/:vid', path: async (f) => `/api/variants/${await f.freshVariant()}`,
    body: async (f, path) => { const v = await currentVersion(f, path); return { model: v.model, version: v.version }; }, expect: design,
  },
  { method: 'post', route: 'POST /variants/:vid/copy', path: (f) => `/api/variants/${f.vid}/copy`, body: () => ({ name: 'Branch' }), expect: created },
  { method: 'del', route: 'DELETE /variants/:vid', path: async (f) => `/api/variants/${await f.freshVariant()}`, expect: gone },
  { method: 'get', route: 'GET /variants/:vid/versions', path: (f) => `/api/variants/${f.vid}/versions`, expect: all },
  { method: 'get', route: 'GET /variants/:vid/versions/:n', path: (f) => `/api/variants/${f.vid}/versions/1`, expect: all },
  { method: 'post', route: 'POST /variants/:vid/versions/:n/restore', path: async (f) => `/api/variants/${await f.freshVariant()}/versions/1/restore`, expect: design },
  { method: 'patch', route: 'PATCH /variants/:vid/status (request review)', path: async (f) => `/api/variants/${await f.freshVariant()}/status`, body: () => ({ status: 'in_review' }), expect: design },
  { method: 'patch', route: 'PATCH /variants/:vid/status (approve)', path: async (f) => `/api/variants/${await f.freshVariant('in_review')}/status`, body: () => ({ status: 'approved' }), expect: [200, 403, 200] },
  { method: 'patch', route: 'PATCH /variants/:vid/status (request changes)', path: async (f) => `/api/variants/${await f.freshVariant('in_review')}/status`, body: () => ({ status: 'changes_requested' }), expect: [200, 403, 200] },
  { method: 'get', route: 'GET /variants/:vid/comments', path: (f) => `/api/variants/${f.vid}/comments`, expect: all },
  { method: 'post', route: 'POST /variants/:vid/comments', path: (f) => `/api/variants/${f.vid}/comments`, body: () => ({ text: 'Looks warm near the I/O die.', partId: 'cpu0' }), expect: [201, 201, 201] },
  {
    method: 'del', route: 'DELETE /comments/:id (owner\'s comment)',
    path: async (f) => `/api/comments/${(await f.owner.post(`/api/variants/${f.vid}/comments`, { text: 'temporary' })).body.id}`,
    expect: [204, 403, 403],
  },
  { method: 'get', route: 'GET /workspaces/:wid/materials', path: (f) => `/api/workspaces/${f.wid}/materials`, expect: all },
  { method: 'post', route: 'POST /workspaces/:wid/materials', path: (f) => `/api/workspaces/${f.wid}/materials`, body: () => ({ name: 'Mold compound', kxy: 0.9, kz: 0.9, rho: 1900, cp: 900 }), expect: created },
  { method: 'patch', route: 'PATCH /materials/:id', path: async (f) => `/api/materials/${await f.freshMaterial()}`, body: () => ({ source: 'common practice' }), expect: design },
  { method: 'del', route: 'DELETE /materials/:id', path: async (f) => `/api/materials/${await f.freshMaterial()}`, expect: gone },
  { method: 'get', route: 'GET /workspaces/:wid/part-templates', path: (f) => `/api/workspaces/${f.wid}/part-templates`, expect: all },
  { method: 'post', route: 'POST /workspaces/:wid/part-templates', path: (f) => `/api/workspaces/${f.wid}/part-templates`, body: () => ({ name: 'Chiplet 10 mm', part: templatePart }), expect: created },
  { method: 'patch', route: 'PATCH /part-templates/:id', path: async (f) => `/api/part-templates/${await f.freshPartTemplate()}`, body: () => ({ note: 'checked' }), expect: design },
  { method: 'del', route: 'DELETE /part-templates/:id', path: async (f) => `/api/part-templates/${await f.freshPartTemplate()}`, expect: gone },
  { method: 'get', route: 'GET /variants/:vid/export.json', path: (f) => `/api/variants/${f.vid}/export.json`, expect: all },
  {
    method: 'post', route: 'POST /assemblies/:aid/import', path: (f) => `/api/assemblies/${f.aid}/import`,
    body: async (f) => ({ name: 'Imported', model: (await f.owner.get(`/api/variants/${f.vid}`)).body.model }), expect: created,
  },
  { method: 'post', route: 'POST /solve/channel', path: () => '/api/solve/channel', body: () => channelBody, expect: all, outsider: 200 },
  { method: 'post', route: 'POST /variants/:vid/solve', path: (f) => `/api/variants/${f.vid}/solve`, body: () => ({ scenarioId: 'idle' }), expect: design },
  { method: 'post', route: 'POST /variants/:vid/timeline', path: (f) => `/api/variants/${f.vid}/timeline`, body: () => ({ scenarioId: 'boost' }), expect: design },
  {
    method: 'post', route: 'POST /variants/:vid/timing', path: (f) => `/api/variants/${f.vid}/timing`,
    body: () => ({ partId: 'cpu-w', scenarioId: 'boost', boostPower: 145, startFrom: 'idle', period: 0.1 }), expect: design,
  },
  {
    method: 'get', route: 'GET /variants/:vid/results',
    path: async (f) => { await f.owner.post(`/api/variants/${f.vid}/solve`, { scenarioId: 'idle' }); return `/api/variants/${f.vid}/results?scenarioId=idle`; },
    expect: all,
  },
];

let t: TestApp;
let f: Fixture;
const clients = {} as Record<Who, Client>;

beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  clients.owner = f.owner;
  clients.engineer = await signedIn(t.app, 'engineer');
  clients.reviewer = await signedIn(t.app, 'reviewer');
  await createUser(t, 'olga.outsider@elsewhere.example', 'outsider-password', { newName: 'Elsewhere Labs' });
  clients.outsider = new Client(t.app);
  expect((await clients.outsider.login('olga.outsider@elsewhere.example', 'outsider-password')).status).toBe(200);
  clients.anon = new Client(t.app);
  await clients.anon.csrf();
});
afterAll(async () => t.dispose());

const whos: Who[] = ['owner', 'engineer', 'reviewer', 'outsider', 'anon'];

describe.each(cases)('$route', (c) => {
  it.each(whos)('as %s', async (who) => {
    const expected = who === 'anon' ? (c.anon ?? 401) : who === 'outsider' ? (c.outsider ?? 404) : c.expect[whos.indexOf(who)];
    const path = await c.path(f);
    const body = c.body ? await c.body(f, path) : undefined;
    const client = clients[who];
    const res = c.method === 'get' ? await client.get(path) : c.method === 'del' ? await client.del(path) : await client[c.method](path, body ?? {});
    expect(res.status, `${c.route} as ${who}: ${JSON.stringify(res.body)}`).toBe(expected);
    if (res.status >= 400) expect(res.body.error.code).toBeTypeOf('string');
  });
});
