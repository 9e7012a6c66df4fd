/** The start command: `tsx server/index.ts` listens, answers, and exits cleanly (code 0) on SIGTERM. */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

describe('server/index.ts', () => {
  it('starts on a free port, serves the API and shuts down on SIGTERM', async () => {
    const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-start-'));
    const child = spawn('node_modules/.bin/tsx', ['server/index.ts'], {
      env: { ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'info', PORT: '0', SMTP_FAKE_PORT: '0', HEATLOOM_DATA_DIR: dataDir },
      stdio: ['ignore', 'pipe', 'pipe'],
      detached: true,
    });
    let out = '';
    child.stdout.on('data', (d) => (out += String(d)));
    child.stderr.on('data', (d) => (out += String(d)));
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    try {
      const url = await new Promise<string>((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error(`no start line in: ${out}`)), 60000);
        child.stdout.on('data', () => {
          const m = /running at (http:\/\/[\d.]+:\d+)/.exec(out);
          if (m && out.includes('Demo sign-in:')) {
            clearTimeout(timer);
            resolve(m[1]);
          }
        });
      });
      expect(out).toContain('Demo sign-in:');
      const res = await fetch(`${url}/api/auth/setup`);
      expect(await res.json()).toEqual({ needed: false });
      process.kill(child.pid!, 'SIGTERM');
      expect(await exited).toBe(0);
      expect(out).toContain('SIGTERM received');
    } finally {
      try {
        process.kill(-child.pid!, 'SIGKILL');
      } catch {
        /* already gone */
      }
      fs.rmSync(dataDir, { recursive: true, force: true });
    }
  });
});
