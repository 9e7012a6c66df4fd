/** Starts the built server on a free port with a fresh data folder (demo seeded), stops it afterwards. */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const addr = srv.address();
      srv.close(() => (typeof addr === 'object' && addr ? resolve(addr.port) : reject(new Error('no port'))));
    });
  });
}

async function waitFor(url: string, ms: number): Promise<void> {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    try {
      const res = await fetch(url);
      if (res.status < 500) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`server did not answer ${url} within ${ms} ms`);
}

let child: ChildProcess | undefined;
let dataDir = '';

export default async function setup(project: TestProject): Promise<() => void> {
  if (!existsSync('dist/index.html')) throw new Error('Build the client first: npm run build');
  const port = await freePort();
  const smtpPort = await freePort();
  dataDir = mkdtempSync(join(tmpdir(), 'heatloom-e2e-'));
  const base = `http://127.0.0.1:${port}`;
  child = spawn('node_modules/.bin/tsx', ['server/index.ts'], {
    env: { ...process.env, NODE_ENV: 'production', PORT: String(port), HOST: '127.0.0.1', HEATLOOM_DATA_DIR: dataDir, SMTP_FAKE_PORT: String(smtpPort), PUBLIC_URL: base, SESSION_SECRET: 'e2e-only-secret-not-for-production' },
    stdio: ['ignore', 'inherit', 'inherit'],
    detached: true,
  });
  await waitFor(`${base}/api/auth/setup`, 60000);
  project.provide('baseUrl', base);
  project.provide('dataDir', dataDir);
  return () => {
    if (child?.pid) {
      try {
        process.kill(-child.pid, 'SIGTERM');
      } catch {
        /* already gone */
      }
    }
    rmSync(dataDir, { recursive: true, force: true });
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    /** The server's data folder (to read what its local mail server kept, as `npm run cli -- mail` does). */
    dataDir: string;
  }
}
