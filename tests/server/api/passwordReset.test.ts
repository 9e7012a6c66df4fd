/**
 * Self-service password reset through the local SMTP server: ask for a link, read the personal mail
 * (workspace null, not in any Outbox), set a new password once, sessions end. Expected behaviour:
 * OWASP Forgot Password cheat sheet (common practice): same answer for every address, single-use
 * hashed token with a short expiry, sessions ended after the change.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { Client, makeTestApp, type TestApp } from '../helpers/testApp';
import { createUser, demoFixture, type Fixture } from '../helpers/fixtures';
import { PASSWORD_RESET_REQUESTED } from '../../../shared/schemas/passwordReset';
import { sha256 } from '../../../server/lib/tokens';

let t: TestApp;
let f: Fixture;
beforeAll(async () => {
  t = await makeTestApp({ LOGIN_RATE_LIMIT: '100' });
  f = await demoFixture(t);
});
afterAll(async () => t.dispose());

interface Row { to: string; text: string; html: string; workspace_id: number | null }

async function mailsTo(email: string): Promise<Row[]> {
  const [rows] = await t.sequelize.query('SELECT "to", text, html, workspace_id FROM outbox_messages WHERE "to" = ? ORDER BY id', { replacements: [email] });
  return rows as Row[];
}

/** The mail is sent after the 202 answer: wait (bounded) until `count` mails to `email` are kept. */
async function waitForMails(email: string, count: number): Promise<Row[]> {
  for (let i = 0; i < 500; i++) {
    const rows = await mailsTo(email);
    if (rows.length >= count) return rows;
    await new Promise((r) => setTimeout(r, 10));
  }
  throw new Error(`no ${count} mail(s) to ${email}`);
}

const linkToken = (mail: Row): string => /http:\/\/heatloom\.test\/reset\/([A-Za-z0-9_-]+)/.exec(mail.text)![1];

async function guest(): Promise<Client> {
  const c = new Client(t.app);
  await c.csrf();
  return c;
}

/** Date the user's links a minute and more back, past the cooldown between two mails to one person. */
async function pastCooldown(email: string): Promise<void> {
  await t.sequelize.query(
    "UPDATE password_resets SET created_at = '2000-01-01 00:00:00.000 +00:00' WHERE user_id = (SELECT id FROM users WHERE email = ?)",
    { replacements: [email] },
  );
}

/** Ask for a link for `email` and return the token of the newest mail to it. */
async function askToken(email: string): Promise<string> {
  await pastCooldown(email);
  const before = (await mailsTo(email)).length;
  const res = await (await guest()).post('/api/auth/password-reset', { email });
  expect(res.status).toBe(202);
  return linkToken((await waitForMails(email, before + 1)).at(-1)!);
}

let counter = 0;
async function freshUser(): Promise<{ email: string; password: string }> {
  const email = `reset.person.${++counter}@larkspur.example`;
  await createUser(t, email, 'old-password-123', { id: f.wid, role: 'engineer' });
  return { email, password: 'old-password-123' };
}

describe('password reset', () => {
  it('mails a personal link (workspace null, not in the owner\'s Outbox) and logs how to read it, without the token', async () => {
    const { email } = await freshUser();
    const info = vi.spyOn(t.ctx.logger, 'info');
    const res = await (await guest()).post('/api/auth/password-reset', { email: `  ${email.toUpperCase()} ` });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ message: PASSWORD_RESET_REQUESTED });
    const [mail] = await waitForMails(email, 1);
    expect(mail.workspace_id).toBeNull();
    const token = linkToken(mail);
    expect(mail.html).toContain(`/reset/${token}`);
    const [row] = (await t.sequelize.query('SELECT token_hash FROM password_resets ORDER BY id DESC LIMIT 1'))[0] as { token_hash: string }[];
    expect(row.token_hash).toBe(sha256(token));
    const outbox = (await f.owner.get(`/api/workspaces/${f.wid}/outbox`)).body as { to: string }[];
    expect(outbox.some((m) => m.to.includes(email))).toBe(false);
    const logged = info.mock.calls.map((c) => String(c[0])).filter((m) => m.includes('mail --to'));
    expect(logged).toHaveLength(1);
    expect(logged[0]).not.toContain(token);
    info.mockRestore();
  });

  it('answers an unknown address the same way and sends nothing', async () => {
    const unknown = 'nobody.here@larkspur.example';
    const res = await (await guest()).post('/api/auth/password-reset', { email: unknown });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ message: PASSWORD_RESET_REQUESTED });
    // a known address asked right after: its mail arriving means the unknown one's look-up has finished
    const { email } = await freshUser();
    await askToken(email);
    expect(await mailsTo(unknown)).toEqual([]);
  });

  it('sets the new password once; the old one stops working; every session of the user ends', async () => {
    const { email, password } = await freshUser();
    const signedIn = new Client(t.app);
    expect((await signedIn.login(email, password)).status).toBe(200);
    const token = await askToken(email);

    const c = await guest();
    expect((await c.get(`/api/auth/password-reset/${token}`)).body).toEqual({ email });
    expect((await c.post(`/api/auth/password-reset/${token}`, { password: 'new-password-456' })).status).toBe(204);

    expect((await signedIn.get('/api/auth/me')).status).toBe(401);
    expect((await new Client(t.app).login(email, password)).status).toBe(401);
    expect((await new Client(t.app).login(email, 'new-password-456')).status).toBe(200);
    const [row] = (await t.sequelize.query('SELECT used_at FROM password_resets WHERE token_hash = ?', { replacements: [sha256(token)] }))[0] as { used_at: string | null }[];
    expect(row.used_at).toBeTruthy();

    expect((await c.get(`/api/auth/password-reset/${token}`)).status).toBe(404);
    expect((await c.post(`/api/auth/password-reset/${token}`, { password: 'third-password-789' })).status).toBe(404);
    expect((await new Client(t.app).login(email, 'new-password-456')).status).toBe(200);
  });

  it('sends one mail per person per minute, however often and from wherever it is asked for', async () => {
    const { email } = await freshUser();
    const token = await askToken(email);
    for (let i = 0; i < 3; i++) expect((await (await guest()).post('/api/auth/password-reset', { email })).status).toBe(202);
    await new Promise((r) => setTimeout(r, 200));
    expect(await mailsTo(email)).toHaveLength(1);
    expect((await (await guest()).get(`/api/auth/password-reset/${token}`)).status).toBe(200);
  });

  it('answers 404 for an expired link, a replaced link and an unknown token', async () => {
    const { email } = await freshUser();
    const late = await askToken(email);
    await t.sequelize.query('UPDATE password_resets SET expires_at = ? WHERE token_hash = ?', { replacements: ['2000-01-01 00:00:00.000 +00:00', sha256(late)] });
    const c = await guest();
    expect((await c.get(`/api/auth/password-reset/${late}`)).status).toBe(404);
    expect((await c.post(`/api/auth/password-reset/${late}`, { password: 'new-password-456' })).status).toBe(404);

    const first = await askToken(email);
    const second = await askToken(email);
    expect((await c.get(`/api/auth/password-reset/${first}`)).status).toBe(404);
    expect((await c.get(`/api/auth/password-reset/${second}`)).status).toBe(200);

    expect((await c.get('/api/auth/password-reset/this-token-does-not-exist-at-all')).status).toBe(404);
    expect((await c.get('/api/auth/password-reset/x')).status).toBe(404);
  });

  it('refuses bad bodies (400) and writes without the CSRF token (403)', async () => {
    const c = await guest();
    const bad = await c.post('/api/auth/password-reset', { email: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.issues.map((i: { path: string }) => i.path)).toEqual(['email']);
    expect((await c.post('/api/auth/password-reset', {})).status).toBe(400);
    const { email } = await freshUser();
    const token = await askToken(email);
    const short = await c.post(`/api/auth/password-reset/${token}`, { password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.details.issues).toEqual([{ path: 'password', message: 'at least 10 characters' }]);
    expect((await c.get(`/api/auth/password-reset/${token}`)).status).toBe(200);
    expect((await new Client(t.app).agent.post('/api/auth/password-reset').send({ email })).status).toBe(403);
  });

  it('limits requests per client address, successful ones included (limit 2 here)', async () => {
    const small = await makeTestApp({ LOGIN_RATE_LIMIT: '2', SEED_DEMO: 'false' });
    try {
      const c = new Client(small.app);
      await c.csrf();
      const statuses: number[] = [];
      for (let i = 0; i < 3; i++) statuses.push((await c.post('/api/auth/password-reset', { email: `x${i}@larkspur.example` })).status);
      expect(statuses).toEqual([202, 202, 429]);
    } finally {
      await small.dispose();
    }
  });
});
