/** Sign-in, sign-out, "me", CSRF rejection and the demo seed's accounts. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, type TestApp } from '../helpers/testApp';
import { demoUsers, DEMO_WORKSPACE } from '../../../server/db/seeders/demoUsers';

let t: TestApp;
beforeAll(async () => {
  t = await makeTestApp();
});
afterAll(async () => t.dispose());

describe('auth', () => {
  it('answers 401 on /me before sign-in', async () => {
    const res = await new Client(t.app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
  });

  it('signs the demo engineer in, shows memberships, signs out', async () => {
    const c = new Client(t.app);
    const login = await c.login(demoUsers.engineer.email, demoUsers.engineer.password);
    expect(login.status).toBe(200);
    expect(login.body.user.email).toBe(demoUsers.engineer.email);
    expect(login.body.memberships).toEqual([expect.objectContaining({ workspaceName: DEMO_WORKSPACE, role: 'engineer' })]);
    const me = await c.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.name).toBe(demoUsers.engineer.name);
    expect((await c.post('/api/auth/logout')).status).toBe(204);
    expect((await c.get('/api/auth/me')).status).toBe(401);
  });

  it('rejects a wrong password with 401 and one message for unknown e-mail too', async () => {
    const c = new Client(t.app);
    const wrong = await c.login(demoUsers.owner.email, 'not-the-password');
    const unknown = await c.login('nobody@larkspur.example', 'not-the-password');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it('issues a new session id on sign-in (no fixation)', async () => {
    const c = new Client(t.app);
    const before = (await c.agent.get('/api/auth/csrf')).headers['set-cookie']?.[0]?.split(';')[0];
    c.token = '';
    const login = await c.login(demoUsers.reviewer.email, demoUsers.reviewer.password);
    const after = login.headers['set-cookie']?.[0]?.split(';')[0];
    expect(before).toBeTruthy();
    expect(after).toBeTruthy();
    expect(after).not.toBe(before);
  });

  it('sets an httpOnly, SameSite=Lax session cookie', async () => {
    const res = await new Client(t.app).get('/api/auth/csrf');
    const cookie = res.headers['set-cookie']?.[0] ?? '';
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('rejects writes without or with a wrong CSRF token (403)', async () => {
    const c = new Client(t.app);
    await c.csrf();
    const none = await c.agent.post('/api/auth/login').send({ email: demoUsers.owner.email, password: demoUsers.owner.password });
    expect(none.status).toBe(403);
    expect(none.body.error.code).toBe('csrf');
    const bad = await c.agent.post('/api/auth/login').set('x-csrf-token', 'forged').send({ email: demoUsers.owner.email, password: demoUsers.owner.password });
    expect(bad.status).toBe(403);
  });

  it('answers 400 with the field path for a malformed login body', async () => {
    const c = new Client(t.app);
    await c.csrf();
    const res = await c.post('/api/auth/login', { email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    const paths = res.body.error.details.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['email', 'password']));
  });

  it('answers 400 (not 500) for invalid JSON', async () => {
    const c = new Client(t.app);
    await c.csrf();
    const res = await c.agent.post('/api/auth/login').set('x-csrf-token', c.token).set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/JSON/);
  });

  it('reports setup as not needed once users exist, and refuses a second setup', async () => {
    const c = new Client(t.app);
    expect((await c.get('/api/auth/setup')).body).toEqual({ needed: false });
    await c.csrf();
    const res = await c.post('/api/auth/setup', { email: 'x@larkspur.example', name: 'X', password: 'long-enough-password', workspaceName: 'W' });
    expect(res.status).toBe(409);
  });

  it('lets a user rename themselves and change their password (current one required, other sessions end)', async () => {
    const c = new Client(t.app);
    await c.login(demoUsers.owner.email, demoUsers.owner.password);
    const renamed = await c.patch('/api/auth/me', { name: 'Ada Q.' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.user.name).toBe('Ada Q.');
    expect((await c.post('/api/auth/password', { currentPassword: 'wrong-one', newPassword: 'a-brand-new-password' })).status).toBe(401);
    const same = await c.post('/api/auth/password', { currentPassword: demoUsers.owner.password, newPassword: demoUsers.owner.password });
    expect(same.status).toBe(400);
    const elsewhere = new Client(t.app);
    await elsewhere.login(demoUsers.owner.email, demoUsers.owner.password);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(200);
    const changed = await c.post('/api/auth/password', { currentPassword: demoUsers.owner.password, newPassword: 'a-brand-new-password' });
    expect(changed.status).toBe(200);
    c.token = changed.body.csrfToken;
    expect((await c.get('/api/auth/me')).status).toBe(200);
    expect((await elsewhere.get('/api/auth/me')).status, 'the other session ends with a password change').toBe(401);
    expect((await new Client(t.app).login(demoUsers.owner.email, demoUsers.owner.password)).status).toBe(401);
    expect((await new Client(t.app).login(demoUsers.owner.email, 'a-brand-new-password')).status).toBe(200);
    await c.post('/api/auth/password', { currentPassword: 'a-brand-new-password', newPassword: demoUsers.owner.password });
    await c.patch('/api/auth/me', { name: demoUsers.owner.name });
  });
});
