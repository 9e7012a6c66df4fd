/** Bad input: 400 with the failing field's path and a readable message; never 500; unknown ids 404. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, signedIn, type Client, type TestApp } from '../helpers/testApp';
import { demoFixture, type Fixture } from '../helpers/fixtures';

let t: TestApp;
let f: Fixture;
let engineer: Client;
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  engineer = await signedIn(t.app, 'engineer');
});
afterAll(async () => t.dispose());

const paths = (res: { body: { error: { details: { issues: { path: string }[] } } } }) => res.body.error.details.issues.map((i) => i.path);

describe('validation', () => {
  it('names the model field that fails (negative layer thickness)', async () => {
    const v = (await engineer.get(`/api/variants/${f.vid}`)).body;
    const model = structuredClone(v.model);
    model.stack.lid.layers[0].thickness = -1;
    const res = await engineer.put(`/api/variants/${f.vid}`, { model, version: v.version });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(paths(res)).toContain('model.stack.lid.layers.0.thickness');
    expect(res.body.error.message).toContain('model.stack.lid.layers.0.thickness');
    expect((await engineer.get(`/api/variants/${f.vid}`)).body.version).toBe(v.version);
  });

  it('names missing fields of a project and a material', async () => {
    const p = await engineer.post(`/api/workspaces/${f.wid}/projects`, { name: '   ' });
    expect(p.status).toBe(400);
    expect(paths(p)).toEqual(['name']);
    const m = await engineer.post(`/api/workspaces/${f.wid}/materials`, { name: 'Bad', kxy: -3, kz: 'x', rho: 1, cp: 1 });
    expect(m.status).toBe(400);
    expect(paths(m).sort()).toEqual(['kxy', 'kz']);
  });

  it('rejects an empty patch, a bad status and an unknown part of the request with 400', async () => {
    expect((await engineer.patch(`/api/projects/${f.pid}`, {})).status).toBe(400);
    const s = await engineer.patch(`/api/variants/${f.vid}/status`, { status: 'shipped' });
    expect(s.status).toBe(400);
    expect(paths(s)).toEqual(['status']);
    expect((await engineer.put(`/api/variants/${f.vid}`, { model: 'not a model', version: 'one' })).status).toBe(400);
    expect((await engineer.get(`/api/projects/${f.pid}/activity?limit=abc`)).status).toBe(400);
  });

  it('answers 404 for unknown and malformed ids, and for unknown API routes', async () => {
    for (const url of ['/api/projects/999999', '/api/projects/abc', '/api/variants/-1', '/api/assemblies/1.5', '/api/workspaces/0', '/api/nothing-here']) {
      const res = await engineer.get(url);
      expect(res.status, url).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
  });

  it('answers 413 for a body over the limit and 400 for non-object JSON, never 500', async () => {
    const big = { name: 'x', description: 'y'.repeat(2.2 * 1024 * 1024) };
    expect((await engineer.post(`/api/workspaces/${f.wid}/projects`, big)).status).toBe(413);
    const arr = await engineer.agent.post(`/api/workspaces/${f.wid}/projects`).set('x-csrf-token', engineer.token).set('Content-Type', 'application/json').send('[1,2]');
    expect(arr.status).toBe(400);
    const nul = await engineer.agent.post(`/api/workspaces/${f.wid}/projects`).set('x-csrf-token', engineer.token).set('Content-Type', 'application/json').send('null');
    expect(nul.status).toBe(400);
  });

  it('fuzzes write routes with odd bodies without a single 500', async () => {
    const bodies: unknown[] = [{}, { name: 42 }, { model: {} }, { model: null, version: -1 }, { text: '' }, { role: 'owner', email: [] }, { status: null }];
    const routes = [
      ['post', `/api/workspaces/${f.wid}/projects`], ['patch', `/api/projects/${f.pid}`], ['post', `/api/projects/${f.pid}/assemblies`],
      ['post', `/api/assemblies/${f.aid}/variants`], ['put', `/api/variants/${f.vid}`], ['post', `/api/variants/${f.vid}/copy`],
      ['patch', `/api/variants/${f.vid}/status`], ['post', `/api/variants/${f.vid}/comments`], ['post', `/api/workspaces/${f.wid}/materials`],
      ['post', `/api/workspaces/${f.wid}/part-templates`], ['post', `/api/workspaces/${f.wid}/invitations`],
    ] as const;
    for (const [method, url] of routes) {
      for (const body of bodies) {
        const res = await f.owner[method](url, body as object);
        expect(res.status, `${method} ${url} ${JSON.stringify(body)}`).toBeLessThan(500);
      }
    }
  });
});
