/**
 * `npm run faults -- [--rounds N] [--writers N] [--kill-after MS]`: injects faults into a Heatloom
 * server started here on 127.0.0.1 with throw-away data folders, and prints what held:
 * SIGKILL during saves, two engineers saving the same variant, a full disk and a read-only data
 * folder (both on a tiny tmpfs in a private mount namespace: needs `unshare -m`, i.e. root or
 * CAP_SYS_ADMIN; skipped with a note otherwise). Bounded: stops by itself. See docs/reliability.md.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { killDuringSaves } from './reliability/killDuringSaves';
import { conflictingSaves } from './reliability/conflictingSaves';
import { fullDisk, readOnlyFolder, unshareAvailable } from './reliability/storageFaults';

async function main(): Promise<void> {
  const { values } = parseArgs({ options: { rounds: { type: 'string' }, writers: { type: 'string' }, 'kill-after': { type: 'string' } } });
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-faults-'));
  const out: Record<string, unknown> = {};
  try {
    const kill = await killDuringSaves({
      dataDir: path.join(tmp, 'kill'),
      rounds: Number(values.rounds ?? 3),
      writers: Number(values.writers ?? 4),
      killAfterMs: Number(values['kill-after'] ?? 1500),
    });
    out.killDuringSaves = kill;
    console.log('SIGKILL during saves:', JSON.stringify(kill));
    const conflict = await conflictingSaves(path.join(tmp, 'conflict'));
    out.conflictingSaves = conflict;
    console.log('Two engineers, one variant:', JSON.stringify(conflict));
    if (await unshareAvailable()) {
      const full = await fullDisk(path.join(tmp, 'full'));
      out.fullDisk = full;
      console.log('Full disk:', JSON.stringify(full));
      const ro = await readOnlyFolder(path.join(tmp, 'ro'));
      out.readOnly = ro;
      console.log('Read-only data folder:', JSON.stringify(ro));
    } else {
      console.log('Full disk and read-only folder skipped: `unshare -m` is not permitted here (needs root or CAP_SYS_ADMIN).');
    }
    const lost = [out.killDuringSaves, out.fullDisk].reduce((n: number, r) => n + ((r as { lost?: number } | undefined)?.lost ?? 0), 0);
    console.log(`\nData lost: ${lost} acknowledged saves.`);
    if (lost > 0) process.exitCode = 1;
  } finally {
    fs.rmSync(tmp, { recursive: true, force: true });
  }
}

main().catch((err: Error) => {
  console.error(`Fault run failed: ${err.stack ?? err.message}`);
  process.exit(1);
});
