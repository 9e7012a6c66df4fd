/** Invitation round trip through the local SMTP server: invite, read the mail in the outbox, follow the link, accept, sign in. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, signedIn, type TestApp } from '../helpers/testApp';
import { demoFixture, type Fixture } from '../helpers/fixtures';
import { demoUsers } from '../../../server/db/seeders/demoUsers';

let t: TestApp;
let f: Fixture;
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
});
afterAll(async () => t.dispose());

/** The invitation token from the newest outbox message to `email`. */
async function tokenFromOutbox(email: string): Promise<string> {
  const res = await f.owner.get(`/api/workspaces/${f.wid}/outbox`);
  expect(res.status).toBe(200);
  const mail = res.body.find((m: { to: string }) => m.to.includes(email));
  expect(mail, `a mail to ${email} in the outbox`).toBeTruthy();
  const match = /http:\/\/heatloom\.test\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text);
  expect(match, 'invitation link in the mail text').toBeTruthy();
  return match![1];
}

describe('invitations', () => {
  it('runs the whole round trip for a new colleague', async () => {
    const email = 'noor.newcomer@larkspur.example';
    const inv = await f.owner.post(`/api/workspaces/${f.wid}/invitations`, { email, role: 'engineer' });
    expect(inv.status).toBe(201);
    expect(inv.body.mailDelivered).toBe(true);

    const outbox = (await f.owner.get(`/api/workspaces/${f.wid}/outbox`)).body;
    expect(outbox[0].subject).toContain('Larkspur Compute (demo)');
    expect(outbox[0].html).toContain('/invite/');
    const token = await tokenFromOutbox(email);

    const guest = new Client(t.app);
    await guest.csrf();
    const noName = await guest.post(`/api/invitations/${token}/accept`, { name: '  ', password: 'a-good-long-password' });
    expect(noName.status).toBe(400);
    expect(noName.body.error.details.issues).toEqual([{ path: 'name', message: 'required' }]);
    const look = await guest.get(`/api/invitations/${token}`);
    expect(look.status).toBe(200);
    expect(look.body).toEqual({ workspaceName: 'Larkspur Compute (demo)', email, role: 'engineer', accountExists: false });

    const accepted = await guest.post(`/api/invitations/${token}/accept`, { name: 'Noor Newcomer', password: 'a-good-long-password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user.email).toBe(email);
    expect(accepted.body.memberships[0].role).toBe('engineer');
    guest.token = accepted.body.csrfToken;
    expect((await guest.get(`/api/workspaces/${f.wid}/projects`)).status).toBe(200);

    // single use
    expect((await guest.get(`/api/invitations/${token}`)).status).toBe(404);
    const again = new Client(t.app);
    await again.csrf();
    expect((await again.post(`/api/invitations/${token}/accept`, { name: 'X', password: 'another-long-password' })).status).toBe(404);

    // the new account signs in with its password
    const later = new Client(t.app);
    expect((await later.login(email, 'a-good-long-password')).status).toBe(200);
    const members = (await f.owner.get(`/api/workspaces/${f.wid}/members`)).body;
    expect(members.some((m: { email: string; role: string }) => m.email === email && m.role === 'engineer')).toBe(true);
    expect((await f.owner.get(`/api/workspaces/${f.wid}/invitations`)).body[0].usedAt).toBeTruthy();
  });

  it('answers 404 for unknown and revoked tokens', async () => {
    const guest = new Client(t.app);
    expect((await guest.get('/api/invitations/this-token-does-not-exist-at-all')).status).toBe(404);
    expect((await guest.get('/api/invitations/x')).status).toBe(404);
    const email = 'revoked.person@larkspur.example';
    const inv = await f.owner.post(`/api/workspaces/${f.wid}/invitations`, { email, role: 'reviewer' });
    const token = await tokenFromOutbox(email);
    expect((await f.owner.del(`/api/workspaces/${f.wid}/invitations/${inv.body.id}`)).status).toBe(204);
    expect((await guest.get(`/api/invitations/${token}`)).status).toBe(404);
  });

  it('answers 404 for an expired invitation', async () => {
    const email = 'late.person@larkspur.example';
    const inv = await f.owner.post(`/api/workspaces/${f.wid}/invitations`, { email, role: 'reviewer' });
    const token = await tokenFromOutbox(email);
    await t.sequelize.query('UPDATE invitations SET expires_at = ? WHERE id = ?', { replacements: ['2000-01-01 00:00:00.000 +00:00', inv.body.id] });
    expect((await new Client(t.app).get(`/api/invitations/${token}`)).status).toBe(404);
  });

  it('refuses to invite an existing member (409) and validates the body (400)', async () => {
    const dup = await f.owner.post(`/api/workspaces/${f.wid}/invitations`, { email: demoUsers.reviewer.email, role: 'engineer' });
    expect(dup.status).toBe(409);
    const bad = await f.owner.post(`/api/workspaces/${f.wid}/invitations`, { email: 'nope', role: 'admin' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'role']);
  });

  it('asks for the existing account password when the e-mail already has an account', async () => {
    // the reviewer leaves, then is invited back
    const reviewer = await signedIn(t.app, 'reviewer');
    const me = (await reviewer.get('/api/auth/me')).body;
    expect((await f.owner.del(`/api/workspaces/${f.wid}/members/${me.user.id}`)).status).toBe(204);
    await f.owner.post(`/api/workspaces/${f.wid}/invitations`, { email: demoUsers.reviewer.email, role: 'reviewer' });
    const token = await tokenFromOutbox(demoUsers.reviewer.email);
    const guest = new Client(t.app);
    expect((await guest.get(`/api/invitations/${token}`)).body.accountExists).toBe(true);
    await guest.csrf();
    expect((await guest.post(`/api/invitations/${token}/accept`, { name: '', password: 'wrong-password-here' })).status).toBe(401);
    const ok = await guest.post(`/api/invitations/${token}/accept`, { name: '', password: demoUsers.reviewer.password });
    expect(ok.status).toBe(200);
    expect(ok.body.memberships.map((m: { role: string }) => m.role)).toEqual(['reviewer']);
  });

  it('shows the outbox to owners only (engineer 403)', async () => {
    const engineer = await signedIn(t.app, 'engineer');
    expect((await engineer.get(`/api/workspaces/${f.wid}/outbox`)).status).toBe(403);
  });
});
