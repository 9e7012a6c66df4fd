/** Login rate limiting: after LOGIN_RATE_LIMIT failed attempts the next answer is 429; successes do not count. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, type TestApp } from '../helpers/testApp';
import { demoUsers } from '../../../server/db/seeders/demoUsers';

let t: TestApp;
beforeAll(async () => {
  t = await makeTestApp({ LOGIN_RATE_LIMIT: '3' });
});
afterAll(async () => t.dispose());

describe('login rate limit', () => {
  it('lets successful sign-ins through and blocks the 4th failed attempt', async () => {
    const c = new Client(t.app);
    for (let i = 0; i < 4; i++) expect((await c.login(demoUsers.owner.email, demoUsers.owner.password)).status).toBe(200);
    for (let i = 0; i < 3; i++) expect((await c.login(demoUsers.owner.email, 'wrong-password')).status).toBe(401);
    const blocked = await c.login(demoUsers.owner.email, demoUsers.owner.password);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
  });
});
