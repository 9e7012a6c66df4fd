/** Cross-workspace isolation: a member of another workspace gets 404 for every record here, and lists stay separate. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, type TestApp } from '../helpers/testApp';
import { createUser, demoFixture, type Fixture } from '../helpers/fixtures';

let t: TestApp;
let f: Fixture;
let other: Client;
let otherWid: number;
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  await createUser(t, 'iris.other@elsewhere.example', 'other-password-1', { newName: 'Elsewhere Labs' });
  other = new Client(t.app);
  await other.login('iris.other@elsewhere.example', 'other-password-1');
  otherWid = (await other.get('/api/workspaces')).body[0].id;
});
afterAll(async () => t.dispose());

describe('isolation', () => {
  it('lists only the caller\'s own workspaces', async () => {
    const mine = (await other.get('/api/workspaces')).body;
    expect(mine.map((w: { name: string }) => w.name)).toEqual(['Elsewhere Labs']);
    expect(mine[0].role).toBe('owner');
  });

  it('answers 404 (same as an unknown id) for every record of another workspace', async () => {
    const mid = await f.freshMaterial();
    const tid = await f.freshPartTemplate();
    const urls = [
      `/api/workspaces/${f.wid}`, `/api/workspaces/${f.wid}/projects`, `/api/projects/${f.pid}`, `/api/assemblies/${f.aid}`,
      `/api/variants/${f.vid}`, `/api/variants/${f.vid}/versions`, `/api/variants/${f.vid}/comments`, `/api/projects/${f.pid}/activity`,
      `/api/workspaces/${f.wid}/members`, `/api/workspaces/${f.wid}/outbox`,
    ];
    for (const url of urls) {
      const res = await other.get(url);
      expect(res.status, url).toBe(404);
      expect(res.body.error.message).not.toMatch(/Larkspur|LX-9/);
    }
    expect((await other.patch(`/api/materials/${mid}`, { name: 'stolen' })).status).toBe(404);
    expect((await other.del(`/api/part-templates/${tid}`)).status).toBe(404);
    expect((await other.post(`/api/projects/${f.pid}/assemblies`, { name: 'intrusion' })).status).toBe(404);
    expect((await f.owner.get(`/api/workspaces/${otherWid}/projects`)).status).toBe(404);
  });

  it('keeps the other workspace empty and its owner in charge there', async () => {
    expect((await other.get(`/api/workspaces/${otherWid}/projects`)).body).toEqual([]);
    const p = await other.post(`/api/workspaces/${otherWid}/projects`, { name: 'Their project' });
    expect(p.status).toBe(201);
    expect((await f.owner.get(`/api/projects/${p.body.id}`)).status).toBe(404);
    expect((await f.owner.get(`/api/workspaces/${f.wid}/projects`)).body.some((x: { name: string }) => x.name === 'Their project')).toBe(false);
  });

  it('keeps at least one owner in a workspace (409)', async () => {
    const me = (await f.owner.get('/api/auth/me')).body.user.id;
    expect((await f.owner.patch(`/api/workspaces/${f.wid}/members/${me}`, { role: 'engineer' })).status).toBe(409);
    expect((await f.owner.del(`/api/workspaces/${f.wid}/members/${me}`)).status).toBe(409);
    expect((await f.owner.del(`/api/workspaces/${f.wid}/members/999999`)).status).toBe(404);
  });

  it('lets a member leave a workspace on their own', async () => {
    const uid = await f.freshMember('reviewer');
    const leaver = new Client(t.app);
    const email = (await f.owner.get(`/api/workspaces/${f.wid}/members`)).body.find((m: { userId: number }) => m.userId === uid).email;
    await leaver.login(email, 'member-password-1');
    expect((await leaver.del(`/api/workspaces/${f.wid}/members/${uid}`)).status).toBe(204);
    expect((await leaver.get(`/api/workspaces/${f.wid}`)).status).toBe(404);
  });
});
