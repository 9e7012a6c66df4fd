/** Import routes: validation before saving (a failed import saves nothing), upload size and type limits, previews, role rules. */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { modelToJson } from '@shared/export';
import { makeTestApp, signedIn, type Client, type TestApp } from '../helpers/testApp';
import { demoFixture, type Fixture } from '../helpers/fixtures';

vi.mock('../../../server/api/routes', async (importOriginal) => (await import('./mountIo')).withIoRoutes(importOriginal as never));

let t: TestApp;
let f: Fixture;
let engineer: Client;
let reviewer: Client;
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  engineer = await signedIn(t.app, 'engineer');
  reviewer = await signedIn(t.app, 'reviewer');
});
afterAll(async () => t.dispose());

const upload = (c: Client, url: string, content: string | Buffer, filename: string, contentType: string, fields: Record<string, string> = {}) => {
  let req = c.agent.post(url).set('x-csrf-token', c.token).attach('file', Buffer.from(content), { filename, contentType });
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req;
};

/** Variants and activity events of the demo assembly/project, to prove nothing was written. */
async function counts(): Promise<{ variants: number; activity: number }> {
  const variants = (await f.owner.get(`/api/assemblies/${f.aid}/variants`)).body.length;
  const activity = (await f.owner.get(`/api/projects/${f.pid}/activity`)).body.length;
  return { variants, activity };
}

const floorplan = ['name,type,x (mm),y (mm),width (mm),height (mm),power (W)', 'Compute chiplet South,compute,27.5,9,13,15,150', 'I/O die,io,4.8,22,8,10,18', 'Extra memory,memory,15,10.5,11,10,7'].join('\n');

describe('model import', () => {
  it('stores a valid model file uploaded as multipart, named from the file header', async () => {
    const text = modelToJson(lx9Model('C'), { variant: 'C — wider gaps' });
    const res = await upload(engineer, `/api/assemblies/${f.aid}/import`, text, 'c.heatloom.json', 'application/json');
    expect(res.status).toBe(201);
    expect(res.body.name).toBe('C — wider gaps (imported)');
    expect(res.body.model).toEqual(lx9Model('C'));
    expect(res.body.version).toBe(1);
  });

  it('refuses an invalid model with a list of paths, and saves nothing', async () => {
    const before = await counts();
    const obj = JSON.parse(modelToJson(lx9Model('A'), {}));
    obj.parts[0].width = 'wide';
    obj.scenarios[0].loads.ghost = { power: 1 };
    const res = await upload(engineer, `/api/assemblies/${f.aid}/import`, JSON.stringify(obj), 'bad.json', 'application/json');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/Nothing was saved/);
    expect(res.body.error.details.issues.map((i: { path: string }) => i.path)).toContain('parts[0].width');
    const broken = await engineer.post(`/api/assemblies/${f.aid}/import`, { text: '{"stack": ' });
    expect(broken.status).toBe(400);
    expect(await counts()).toEqual(before);
  });

  it('limits uploads by type (415) and size (413), saving nothing', async () => {
    const before = await counts();
    expect((await upload(engineer, `/api/assemblies/${f.aid}/import`, 'GIF89a', 'model.gif', 'image/gif')).status).toBe(415);
    expect((await upload(engineer, `/api/assemblies/${f.aid}/import`, 'a\u0000b', 'model.json', 'application/json')).status).toBe(415);
    const big = await upload(engineer, `/api/assemblies/${f.aid}/import`, ' '.repeat(2 * 1024 * 1024 + 10), 'big.json', 'application/json');
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('upload_too_large');
    expect(await counts()).toEqual(before);
  });

  it('reviewers may not import (403), and nothing is saved', async () => {
    const before = await counts();
    const text = modelToJson(lx9Model('A'), {});
    expect((await upload(reviewer, `/api/assemblies/${f.aid}/import`, text, 'a.json', 'application/json')).status).toBe(403);
    expect((await reviewer.post(`/api/assemblies/${f.aid}/import/floorplan`, { csv: floorplan })).status).toBe(403);
    expect(await counts()).toEqual(before);
  });
});

describe('floorplan import', () => {
  it('previews parts and line-numbered errors without saving', async () => {
    const before = await counts();
    const ok = await upload(reviewer, '/api/import/floorplan/preview', floorplan, 'plan.csv', 'text/csv');
    expect(ok.status).toBe(200);
    expect(ok.body.errors).toEqual([]);
    expect(ok.body.parts.map((p: { line: number; name: string }) => [p.line, p.name])).toEqual([[2, 'Compute chiplet South'], [3, 'I/O die'], [4, 'Extra memory']]);
    const bad = await engineer.post('/api/import/floorplan/preview', { csv: floorplan + '\nBroken,gizmo,1,2,3,4,5' });
    expect(bad.body.errors).toEqual([expect.objectContaining({ line: 5, column: 'type' })]);
    expect(await counts()).toEqual(before);
  });

  it('creates a variant from the assembly\'s first variant with the floorplan\'s parts and powers', async () => {
    const res = await upload(engineer, `/api/assemblies/${f.aid}/import/floorplan`, floorplan, 'plan.csv', 'text/csv', { name: 'From plan' });
    expect(res.status).toBe(201);
    expect(res.body.name).toBe('From plan');
    expect(res.body.model.parts.map((p: { name: string }) => p.name)).toEqual(['Compute chiplet South', 'I/O die', 'Extra memory']);
    expect(res.body.model.scenarios[0].loads['cpu-w'].power).toBe(150);
  });

  it('refuses a floorplan with errors and saves nothing', async () => {
    const before = await counts();
    const res = await engineer.post(`/api/assemblies/${f.aid}/import/floorplan`, { csv: floorplan.replace('27.5', 'abc') });
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues[0].path).toBe('line 2, x');
    expect(await counts()).toEqual(before);
  });
});

describe('power-map CSV', () => {
  it('reads a grid and reports errors by line', async () => {
    const ok = await engineer.post('/api/import/power-map', { csv: '1,2\n3,4' });
    expect(ok.body.map).toEqual({ nx: 2, ny: 2, weights: [3, 4, 1, 2] });
    const bad = await upload(engineer, '/api/import/power-map', '1,2\n3', 'map.csv', 'text/csv');
    expect(bad.body.map).toBeNull();
    expect(bad.body.errors[0].line).toBe(2);
  });

  it('needs a signed-in user', async () => {
    const { Client: Anon } = await import('../helpers/testApp');
    const anon = new Anon(t.app);
    await anon.csrf();
    expect((await anon.post('/api/import/power-map', { csv: '1' })).status).toBe(401);
  });
});
