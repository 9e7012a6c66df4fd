/** Test harness: an app on a fresh temp data folder (fake SMTP on port 0) and a signed-in client helper. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { Response } from 'supertest';
import { loadConfig } from '../../../server/config';
import { createApp, type BuiltApp } from '../../../server/app';
import { demoUsers } from '../../../server/db/seeders/demoUsers';
import type { Role } from '../../../shared/schemas/roles';

/** A built test app and the folder it lives in. */
export interface TestApp extends BuiltApp {
  dataDir: string;
  dispose(): Promise<void>;
}

/** Build an app on a new temp data folder; `env` overrides settings (demo seeded unless SEED_DEMO=false). */
export async function makeTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-test-'));
  const config = loadConfig({ NODE_ENV: 'test', HEATLOOM_DATA_DIR: dataDir, SMTP_FAKE_PORT: '0', PUBLIC_URL: 'http://heatloom.test', ...env });
  const built = await createApp(config);
  return {
    ...built,
    dataDir,
    async dispose() {
      await built.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/** A cookie-keeping client that sends the CSRF token on every write. */
export class Client {
  readonly agent: ReturnType<typeof request.agent>;
  token = '';

  constructor(app: BuiltApp['app']) {
    this.agent = request.agent(app);
  }

  /** Fetch a CSRF token for the current session. */
  async csrf(): Promise<string> {
    this.token = (await this.agent.get('/api/auth/csrf')).body.token;
    return this.token;
  }

  /** Sign in; keeps the fresh CSRF token the login answers with. */
  async login(email: string, password: string): Promise<Response> {
    if (!this.token) await this.csrf();
    const res = await this.agent.post('/api/auth/login').set('x-csrf-token', this.token).send({ email, password });
    if (res.body?.csrfToken) this.token = res.body.csrfToken;
    return res;
  }

  get(url: string) {
    return this.agent.get(url);
  }
  post(url: string, body: object = {}) {
    return this.agent.post(url).set('x-csrf-token', this.token).send(body);
  }
  put(url: string, body: object) {
    return this.agent.put(url).set('x-csrf-token', this.token).send(body);
  }
  patch(url: string, body: object) {
    return this.agent.patch(url).set('x-csrf-token', this.token).send(body);
  }
  del(url: string) {
    return this.agent.delete(url).set('x-csrf-token', this.token);
  }
}

/** A client signed in as the demo user of `role`. */
export async function signedIn(app: BuiltApp['app'], role: Role): Promise<Client> {
  const c = new Client(app);
  const res = await c.login(demoUsers[role].email, demoUsers[role].password);
  if (res.status !== 200) throw new Error(`demo ${role} could not sign in: ${res.status} ${JSON.stringify(res.body)}`);
  return c;
}
