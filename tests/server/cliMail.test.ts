/** `cli mail --to`: reads the local mail server's kept messages to one address from the data folder's database. */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, type TestApp } from './helpers/testApp';

const root = join(__dirname, '..', '..');
let t: TestApp;

function cli(dataDir: string, ...args: string[]): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli.ts', ...args], {
    cwd: root, encoding: 'utf8', timeout: 60000, env: { ...process.env, HEATLOOM_DATA_DIR: dataDir },
  });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

const ME = 'kit.keeper@larkspur.example';

beforeAll(async () => {
  t = await makeTestApp({ SEED_DEMO: 'false' });
  const send = (to: string | string[], subject: string, workspaceId?: number) => t.ctx.mailer.send({ to, subject, text: `body of ${subject}`, workspaceId });
  expect(await send(ME, 'first personal')).toBe(true);
  expect(await send([`other.person@larkspur.example`, ME], 'to two people', 1)).toBe(true);
  expect(await send(`x${ME}`, 'look-alike address')).toBe(true);
  expect(await send('other.person@larkspur.example', 'not mine')).toBe(true);
  expect(await send(ME, 'second personal')).toBe(true);
});
afterAll(async () => t.dispose());

describe('cli mail --to', () => {
  it('prints the newest messages to exactly that address, personal and workspace mail alike', () => {
    const r = cli(t.dataDir, 'mail', '--to', ME.toUpperCase(), '--json');
    expect(r.status).toBe(0);
    const subjects = (JSON.parse(r.stdout) as { subject: string }[]).map((m) => m.subject);
    expect(subjects).toEqual(['second personal', 'to two people', 'first personal']);
  });

  it('prints readable text, at most --limit messages', () => {
    const r = cli(t.dataDir, 'mail', '--to', ME, '--limit', '1');
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('Subject: second personal');
    expect(r.stdout).toContain('body of second personal');
    expect(r.stdout).not.toContain('first personal');
  });

  it('says so when nothing is kept for the address', () => {
    const r = cli(t.dataDir, 'mail', '--to', 'nobody@larkspur.example');
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^No mail to nobody@larkspur\.example/);
  });

  it('exits 2 without an address, with a bad option, or without a database (and creates none)', () => {
    expect(cli(t.dataDir, 'mail').status).toBe(2);
    expect(cli(t.dataDir, 'mail', '--to', 'not-an-address').status).toBe(2);
    expect(cli(t.dataDir, 'mail', '--to', ME, '--limit', '0').status).toBe(2);
    const empty = fs.mkdtempSync(join(os.tmpdir(), 'heatloom-cli-mail-'));
    const r = cli(empty, 'mail', '--to', ME);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/no Heatloom database/);
    expect(fs.readdirSync(empty)).toEqual([]);
    fs.rmSync(empty, { recursive: true, force: true });
  });
});
