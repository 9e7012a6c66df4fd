/**
 * Security re-checks across features: session fixation, CSRF, login brute force, invitation token
 * reuse and expiry, upload size and type limits, security headers, the session secret.
 * Expected behaviour: OWASP Session Management and CSRF cheat sheets (common practice).
 */
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, type TestApp } from '../server/helpers/testApp';
import { demoFixture, type Fixture } from '../server/helpers/fixtures';
import { demoUsers } from '../../server/db/seeders/demoUsers';
import { loadConfig } from '../../server/config';
import { createApp } from '../../server/app';

let t: TestApp;
let f: Fixture;
beforeAll(async () => {
  t = await makeTestApp({ LOGIN_RATE_LIMIT: '3' });
  f = await demoFixture(t);
});
afterAll(async () => t.dispose());

const sid = (res: request.Response) => (res.headers['set-cookie'] as unknown as string[] | undefined)?.find((c) => c.startsWith('heatloom.sid='))?.split(';')[0];

describe('sessions and CSRF', () => {
  it('issues a new session id at sign-in; the pre-sign-in id stays anonymous (no fixation)', async () => {
    const c = new Client(t.app);
    const before = sid(await c.agent.get('/api/auth/csrf'));
    expect(before).toBeTruthy();
    const login = await c.login(demoUsers.reviewer.email, demoUsers.reviewer.password);
    const after = sid(login);
    expect(after).toBeTruthy();
    expect(after).not.toBe(before);
    expect((await request(t.app).get('/api/auth/me').set('cookie', before!)).status).toBe(401);
    expect((await request(t.app).get('/api/auth/me').set('cookie', after!)).status).toBe(200);
  });

  it('refuses writes without the CSRF token or with another session\'s token', async () => {
    const none = await f.owner.agent.post(`/api/workspaces/${f.wid}/projects`).send({ name: 'No token' });
    expect(none.status).toBe(403);
    expect(none.body.error.code).toBe('csrf');
    const other = new Client(t.app);
    const foreign = await other.csrf();
    expect((await f.owner.agent.post(`/api/workspaces/${f.wid}/projects`).set('x-csrf-token', foreign).send({ name: 'Foreign' })).status).toBe(403);
    expect((await f.owner.post(`/api/workspaces/${f.wid}/projects`, { name: 'With token' })).status).toBe(201);
  });

  it('rate-limits failed sign-ins (limit 3 here) with 429, then refuses even the right password', async () => {
    const c = new Client(t.app);
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) statuses.push((await c.login(demoUsers.engineer.email, `wrong-password-${i}`)).status);
    expect(statuses).toEqual([401, 401, 401, 429]);
    expect((await c.login(demoUsers.engineer.email, demoUsers.engineer.password)).status).toBe(429);
  });
});

describe('invitations', () => {
  async function invite(email: string): Promise<{ id: number; token: string }> {
    const inv = await f.owner.post(`/api/workspaces/${f.wid}/invitations`, { email, role: 'reviewer' });
    expect(inv.status).toBe(201);
    const mail = (await f.owner.get(`/api/workspaces/${f.wid}/outbox`)).body.find((m: { to: string }) => m.to.includes(email));
    return { id: inv.body.id, token: /\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text)![1] };
  }

  it('accepts a token once; a second use and an expired token are 404', async () => {
    const { token } = await invite('once.only@larkspur.example');
    const first = new Client(t.app);
    await first.csrf();
    expect((await first.post(`/api/invitations/${token}/accept`, { name: 'Once Only', password: 'a-good-long-password' })).status).toBe(200);
    const second = new Client(t.app);
    await second.csrf();
    expect((await second.post(`/api/invitations/${token}/accept`, { name: 'Twice', password: 'another-long-password' })).status).toBe(404);
    const late = await invite('too.late@larkspur.example');
    await t.sequelize.query('UPDATE invitations SET expires_at = ? WHERE id = ?', { replacements: ['2000-01-01 00:00:00.000 +00:00', late.id] });
    expect((await second.post(`/api/invitations/${late.token}/accept`, { name: 'Late', password: 'a-good-long-password' })).status).toBe(404);
  });
});

describe('uploads and headers', () => {
  it('refuses an upload over 2 MB (413) and a file of the wrong type (415)', async () => {
    const big = Buffer.alloc(2 * 1024 * 1024 + 10, 0x31);
    const tooBig = await f.owner.agent.post('/api/import/power-map').set('x-csrf-token', f.owner.token).attach('file', big, { filename: 'map.csv', contentType: 'text/csv' });
    expect(tooBig.status).toBe(413);
    const wrong = await f.owner.agent.post('/api/import/power-map').set('x-csrf-token', f.owner.token).attach('file', Buffer.from('\x89PNG'), { filename: 'map.png', contentType: 'image/png' });
    expect(wrong.status).toBe(415);
    const bigJson = await f.owner.agent.post('/api/solve/channel').set('x-csrf-token', f.owner.token).set('content-type', 'application/json').send(`{"a":"${'x'.repeat(2 * 1024 * 1024)}"}`);
    expect(bigJson.status).toBe(413);
  });

  it('sends the usual security headers and hides the framework', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(res.headers['content-security-policy']).toMatch(/frame-ancestors 'none'|frame-ancestors 'self'/);
    expect(res.headers['referrer-policy']).toBeTruthy();
    expect(res.headers['x-powered-by']).toBeUndefined();
    const cookie = (await request(t.app).get('/api/auth/csrf')).headers['set-cookie'] as unknown as string[];
    expect(cookie.join(';')).toMatch(/HttpOnly/i);
    expect(cookie.join(';')).toMatch(/SameSite=Lax/i);
  });
});

describe('session secret', () => {
  it('is generated on first start (0600, not in the repository) and kept across restarts', async () => {
    const file = path.join(t.dataDir, 'session-secret');
    expect(fs.statSync(file).mode & 0o077).toBe(0);
    const secret = fs.readFileSync(file, 'utf8');
    const again = await createApp(loadConfig({ NODE_ENV: 'test', HEATLOOM_DATA_DIR: t.dataDir, SMTP_FAKE_PORT: '0' }));
    await again.close();
    expect(fs.readFileSync(file, 'utf8')).toBe(secret);
  });
});
