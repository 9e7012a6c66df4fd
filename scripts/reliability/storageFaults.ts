/**
 * Storage faults on a real tiny file system: the server runs inside a private mount namespace
 * (`unshare -m`) with its data folder on a tmpfs — sized just above the seeded database for a
 * full disk, remounted read-only for a read-only folder. Files are copied out before the
 * namespace ends so the database can be checked afterwards.
 */
import fs from 'node:fs';
import path from 'node:path';
import { execFile } from 'node:child_process';
import sqlite3 from 'sqlite3';
import { demoUsers } from '../../server/db/seeders/demoUsers';
import { HttpSession } from './httpSession';
import { copyVariant, demoVariantId } from './demoData';
import { startExpectingFailure, startServer } from './serverProcess';
import { DB_FILE, integrityCheck } from './sqliteFiles';

/** Bytes of free space left on the tmpfs above the seeded data (a few large saves fill it). */
const HEADROOM = 768 * 1024;

/** True when this process may create a mount namespace and mount a tmpfs in it. */
export function unshareAvailable(): Promise<boolean> {
  return new Promise((resolve) => execFile('unshare', ['-m', 'sh', '-c', 'mount -t tmpfs -o size=64k tmpfs /mnt'], (err) => resolve(!err)));
}

async function seed(dir: string): Promise<number> {
  const s = await startServer({ dataDir: dir });
  await s.stop();
  return fs.readdirSync(dir).reduce((n, f) => n + fs.statSync(path.join(dir, f)).size, 0);
}

function savedMarker(file: string, vid: number, version: number): Promise<number | null> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, sqlite3.OPEN_READONLY);
    db.get('SELECT model FROM variant_versions WHERE variant_id = ? AND version = ?', [vid, version], (err, row: { model: string } | undefined) => {
      db.close();
      if (err) reject(err);
      else resolve(row ? JSON.parse(row.model).stack.cooling.top.fluidTemperature : null);
    });
  });
}

/** What the full-disk run found. */
export interface FullDiskReport {
  tmpfsBytes: number;
  acknowledged: number;
  refused: Record<string, number>;
  readsDuringFull: number;
  integrity: string;
  lost: number;
  savesAfterSpaceFreed: number;
}

/** Fill a tiny tmpfs with large saves; every refusal must be 507 storage_full, every acknowledged save kept. */
export async function fullDisk(dir: string): Promise<FullDiskReport> {
  const seedDir = path.join(dir, 'seed');
  const mnt = path.join(dir, 'mnt');
  const out = path.join(dir, 'out');
  for (const d of [seedDir, mnt, out]) fs.mkdirSync(d, { recursive: true });
  const size = (await seed(seedDir)) + HEADROOM;
  const script = `mount -t tmpfs -o size=${size} tmpfs "${mnt}" && cp -a "${seedDir}/." "${mnt}/" && { "$@" & p=$!; trap 'kill -TERM $p' TERM; wait $p; wait $p; cp -a "${mnt}/." "${out}/"; }`;
  const server = await startServer({ dataDir: mnt, wrap: ['unshare', '-m', 'sh', '-c', script, 'sh'] });
  const report: FullDiskReport = { tmpfsBytes: size, acknowledged: 0, refused: {}, readsDuringFull: 0, integrity: '', lost: 0, savesAfterSpaceFreed: 0 };
  const acks: { vid: number; version: number; marker: number }[] = [];
  let vid = 0;
  try {
    const s = await new HttpSession(server.url).login(demoUsers.engineer.email, demoUsers.engineer.password);
    vid = await copyVariant(s, await demoVariantId(s), 'Full disk test');
    let cur = (await s.request('GET', `/api/variants/${vid}`)).body;
    const part = cur.model.parts[0].id;
    for (let i = 0; i < 40; i++) {
      const marker = 20 + i * 0.01;
      cur.model.stack.cooling.top.fluidTemperature = marker;
      for (const sc of cur.model.scenarios) sc.loads[part] = { ...(sc.loads[part] ?? { power: 1 }), map: { nx: 64, ny: 64, weights: Array.from({ length: 4096 }, (_, k) => ((k * 7919 + i) % 1000) / 7 + Math.random()) } };
      const res = await s.request('PUT', `/api/variants/${vid}`, { model: cur.model, version: cur.version });
      if (res.status === 200) {
        acks.push({ vid, version: res.body.version, marker });
        cur = res.body;
        continue;
      }
      const key = `${res.status} ${res.body?.error?.code}`;
      report.refused[key] = (report.refused[key] ?? 0) + 1;
      if ((await s.request('GET', `/api/variants/${vid}`)).status === 200) report.readsDuringFull++;
      if (Object.values(report.refused).reduce((a, b) => a + b, 0) >= 5) break;
    }
  } finally {
    await server.stop();
  }
  const file = path.join(out, DB_FILE);
  report.integrity = await integrityCheck(file);
  report.acknowledged = acks.length;
  for (const a of acks) if ((await savedMarker(file, a.vid, a.version)) !== a.marker) report.lost++;
  const after = await startServer({ dataDir: out });
  try {
    const s = await new HttpSession(after.url).login(demoUsers.engineer.email, demoUsers.engineer.password);
    const cur = (await s.request('GET', `/api/variants/${vid}`)).body;
    if ((await s.request('PUT', `/api/variants/${vid}`, { model: cur.model, version: cur.version })).status === 200) report.savesAfterSpaceFreed++;
  } finally {
    await after.stop();
  }
  return report;
}

/** What the read-only runs found. */
export interface ReadOnlyReport {
  readOnlyMount: { exitCode: number | null; message: string };
  pathUnderAFile: { exitCode: number | null; message: string };
  seedIntegrity: string;
}

function firstErrorLine(output: string): string {
  return output.split('\n').find((l) => /failed to start|cannot be written/i.test(l))?.trim() ?? output.trim().split('\n').slice(-1)[0];
}

/** Start on a read-only tmpfs holding a seeded database, and on a data path under a regular file: both must refuse to start with a readable message. */
export async function readOnlyFolder(dir: string): Promise<ReadOnlyReport> {
  const seedDir = path.join(dir, 'seed');
  const mnt = path.join(dir, 'mnt');
  for (const d of [seedDir, mnt]) fs.mkdirSync(d, { recursive: true });
  await seed(seedDir);
  const script = `mount -t tmpfs tmpfs "${mnt}" && cp -a "${seedDir}/." "${mnt}/" && mount -o remount,ro "${mnt}" && exec "$@"`;
  const ro = await startExpectingFailure({ dataDir: mnt, wrap: ['unshare', '-m', 'sh', '-c', script, 'sh'] });
  const blocker = path.join(dir, 'a-file');
  fs.writeFileSync(blocker, 'not a folder');
  const under = await startExpectingFailure({ dataDir: path.join(blocker, 'data') });
  return {
    readOnlyMount: { exitCode: ro.code, message: firstErrorLine(ro.output) },
    pathUnderAFile: { exitCode: under.code, message: firstErrorLine(under.output) },
    seedIntegrity: await integrityCheck(path.join(seedDir, DB_FILE)),
  };
}
