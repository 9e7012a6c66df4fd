/** The command line, run as its own process: JSON (or CSV) on stdout only, readable errors on stderr. */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { expectClose } from '../helpers/float';

const root = join(__dirname, '..', '..');
const dir = mkdtempSync(join(tmpdir(), 'heatloom-cli-'));

function cli(...args: string[]): { status: number | null; stdout: string; stderr: string } {
  // node --import tsx: one process (the tsx binary would start a second node).
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

function file(name: string, body: unknown): string {
  const path = join(dir, name);
  writeFileSync(path, typeof body === 'string' ? body : JSON.stringify(body));
  return path;
}

const CHANNEL = {
  footprint: { x: 0.02, y: 0.02 },
  above: { layers: [{ thickness: 0.002, k: 400 }], h: 10000 },
  below: { layers: [], h: 0 },
  sources: [{ x: 0.01, y: 0.01, width: 0.02, height: 0.02, power: 10 }],
};

describe('heatloom CLI', () => {
  it('channel: prints only the response JSON (1-D limit exact: (t/k + 1/h)/A)', () => {
    const r = cli('channel', file('ch.json', CHANNEL));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expectClose(out.matrix[0][0], (0.002 / 400 + 1 / 10000) / 4e-4, 1e-9, 0, 'slab resistance (exact 1-D conduction)');
    expect(out.energyBalance.relativeError).toBeLessThan(1e-6);
  });

  it('channel: bad input exits 2 with the field path on stderr and nothing on stdout', () => {
    const r = cli('channel', file('bad.json', { ...CHANNEL, above: { layers: [{ thickness: 0, k: 400 }], h: 1 } }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/above\.layers\[0\]\.thickness/);
  });

  it('solve: a model file to JSON and to CSV', () => {
    const path = file('lx9.json', lx9Model('A'));
    const json = cli('solve', path, '--scenario', 'boost');
    expect(json.status).toBe(0);
    const result = JSON.parse(json.stdout);
    expect(result.scenario.id).toBe('boost');
    expect(result.parts).toHaveLength(8);
    const csv = cli('solve', path, '--scenario', 'idle', '--csv');
    expect(csv.status).toBe(0);
    expect(csv.stdout.split('\n')[0]).toMatch(/^part,tier,name/);
  });

  it('solve: an unknown scenario exits 2 and names the ones that exist', () => {
    const r = cli('solve', file('lx9b.json', lx9Model('B')), '--scenario', 'turbo');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/idle, boost, memory-bound/);
  });
});
