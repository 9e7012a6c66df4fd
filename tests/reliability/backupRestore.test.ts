/** Backup while the app saves (SQLite online backup), then restore into a stopped data folder with the documented command. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { execFileSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, type TestApp } from '../server/helpers/testApp';
import { demoFixture, type Fixture } from '../server/helpers/fixtures';
import { loadConfig } from '../../server/config';
import { createApp } from '../../server/app';
import { backupDatabase, DB_FILE, integrityCheck, rowCounts } from '../../scripts/reliability/sqliteFiles';
import sqlite3 from 'sqlite3';

let t: TestApp;
let f: Fixture;
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-backup-'));
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
});
afterAll(async () => {
  await t.dispose();
  fs.rmSync(tmp, { recursive: true, force: true });
});

function versionsOf(file: string, vid: number): Promise<{ version: number; maxSaved: number }> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, sqlite3.OPEN_READONLY);
    db.get('SELECT v.version AS version, (SELECT MAX(version) FROM variant_versions WHERE variant_id = v.id) AS maxSaved FROM variants v WHERE v.id = ?', [vid], (err, row) => {
      db.close();
      if (err) reject(err);
      else resolve(row as { version: number; maxSaved: number });
    });
  });
}

describe('backup and restore', () => {
  it('copies a consistent snapshot during a burst of saves, and restores it', async () => {
    const vid = await f.freshVariant();
    const saves = (async () => {
      let { model, version } = (await f.owner.get(`/api/variants/${vid}`)).body;
      for (let i = 0; i < 25; i++) {
        model.stack.cooling.top.fluidTemperature = 25 + i * 0.1;
        const res = await f.owner.put(`/api/variants/${vid}`, { model, version });
        expect(res.status).toBe(200);
        ({ model, version } = res.body);
      }
      return version as number;
    })();
    await new Promise((r) => setTimeout(r, 300));
    const copy = path.join(tmp, 'during.sqlite');
    await backupDatabase(path.join(t.dataDir, DB_FILE), copy);
    const finalVersion = await saves;
    expect(await integrityCheck(copy)).toBe('ok');
    const snap = await versionsOf(copy, vid);
    expect(snap.version, 'the variant row and its history agree in the copy').toBe(snap.maxSaved);
    expect(snap.version).toBeLessThanOrEqual(finalVersion);

    const restoreDir = path.join(tmp, 'restored');
    fs.mkdirSync(restoreDir);
    execFileSync(path.resolve('node_modules/.bin/tsx'), ['scripts/restore.ts', copy, '--data', restoreDir], { stdio: 'pipe', timeout: 60_000 });
    expect(await integrityCheck(path.join(restoreDir, DB_FILE))).toBe('ok');
    expect(await rowCounts(path.join(restoreDir, DB_FILE))).toEqual(await rowCounts(copy));

    const restored = await createApp(loadConfig({ NODE_ENV: 'test', HEATLOOM_DATA_DIR: restoreDir, SMTP_FAKE_PORT: '0' }));
    try {
      const again = await versionsOf(path.join(restoreDir, DB_FILE), vid);
      expect(again.version).toBe(snap.version);
      expect(restored.seeded, 'a restored database is not re-seeded').toBe(false);
    } finally {
      await restored.close();
    }
  });

  it('refuses a damaged backup and leaves the data folder alone', () => {
    const bad = path.join(tmp, 'damaged.sqlite');
    fs.writeFileSync(bad, 'this is not a database');
    const dir = path.join(tmp, 'untouched');
    fs.mkdirSync(dir);
    expect(() => execFileSync(path.resolve('node_modules/.bin/tsx'), ['scripts/restore.ts', bad, '--data', dir], { stdio: 'pipe', timeout: 60_000 })).toThrow(/Restore failed/);
    expect(fs.existsSync(path.join(dir, DB_FILE))).toBe(false);
  });
});
