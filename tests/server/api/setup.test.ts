/** First start without demo data: setup is needed once, creates the first owner and workspace, then is closed. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, type TestApp } from '../helpers/testApp';

let t: TestApp;
beforeAll(async () => {
  t = await makeTestApp({ SEED_DEMO: 'false' });
});
afterAll(async () => t.dispose());

describe('setup of the first owner', () => {
  it('reports setup needed, validates, creates the owner and signs them in', async () => {
    const c = new Client(t.app);
    expect((await c.get('/api/auth/setup')).body).toEqual({ needed: true });
    await c.csrf();
    const weak = await c.post('/api/auth/setup', { email: 'first@example.org', name: 'First', password: 'short', workspaceName: 'Team' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.details.issues[0]).toEqual({ path: 'password', message: 'at least 10 characters' });
    const res = await c.post('/api/auth/setup', { email: 'First@Example.org', name: 'First Owner', password: 'first-owner-password', workspaceName: 'Our team' });
    expect(res.status).toBe(201);
    expect(res.body.user.email).toBe('first@example.org');
    expect(res.body.memberships).toEqual([expect.objectContaining({ workspaceName: 'Our team', role: 'owner' })]);
    c.token = res.body.csrfToken;
    expect((await c.get('/api/auth/me')).status).toBe(200);
    expect((await c.get('/api/auth/setup')).body).toEqual({ needed: false });
    const second = new Client(t.app);
    await second.csrf();
    expect((await second.post('/api/auth/setup', { email: 'x@example.org', name: 'X', password: 'another-password', workspaceName: 'Hijack' })).status).toBe(409);
  });
});
