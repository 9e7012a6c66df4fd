/**
 * SQLite file operations for backup and restore, on the SQLite online backup API
 * (sqlite3 Database#backup → sqlite3_backup_*; https://www.sqlite.org/backup.html): the copy
 * is a consistent snapshot even while the app writes (WAL), and a restore writes through
 * SQLite's own locking instead of copying files under a live connection.
 */
import fs from 'node:fs';
import path from 'node:path';
import sqlite3 from 'sqlite3';

/** Name of the app's database file inside the data folder (server/db/sequelize.ts). */
export const DB_FILE = 'heatloom.sqlite';

/** The part of sqlite3's (untyped) Backup object used here. */
interface Backup {
  step(pages: number, cb: (err: Error | null) => void): void;
  finish(cb?: (err: Error | null) => void): void;
  readonly completed: boolean;
  readonly failed: boolean;
}
type BackupFn = (file: string, destName: string, sourceName: string, filenameIsDest: boolean, cb: (err: Error | null) => void) => Backup;

function open(file: string, mode: number): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, mode, (err) => (err ? reject(err) : resolve(db)));
  });
}

function close(db: sqlite3.Database): Promise<void> {
  return new Promise((resolve, reject) => db.close((err) => (err ? reject(err) : resolve())));
}

function all<T>(db: sqlite3.Database, sql: string): Promise<T[]> {
  return new Promise((resolve, reject) => db.all(sql, (err, rows) => (err ? reject(err) : resolve(rows as T[]))));
}

/** Copy all pages between `db` and `file` in one step (`toFile` true: db → file, else file → db). */
function copyPages(db: sqlite3.Database, file: string, toFile: boolean): Promise<void> {
  return new Promise((resolve, reject) => {
    const backup = (db as unknown as { backup: BackupFn }).backup(file, 'main', 'main', toFile, (initErr) => {
      if (initErr) return reject(initErr);
      backup.step(-1, (err) => {
        backup.finish();
        if (err || !backup.completed) reject(err ?? new Error('the backup did not complete'));
        else resolve();
      });
    });
  });
}

/** `PRAGMA integrity_check` of a database file: 'ok' or the problems SQLite lists (read-write open so a left-over WAL is recovered first). */
export async function integrityCheck(file: string): Promise<string> {
  if (!fs.existsSync(file)) throw new Error(`no database at ${file}`);
  const db = await open(file, sqlite3.OPEN_READWRITE);
  try {
    const rows = await all<{ integrity_check: string }>(db, 'PRAGMA integrity_check');
    return rows.map((r) => r.integrity_check).join('; ');
  } finally {
    await close(db);
  }
}

/** Write a consistent copy of the live database `source` to `dest` (which must not exist). */
export async function backupDatabase(source: string, dest: string): Promise<void> {
  if (!fs.existsSync(source)) throw new Error(`no database at ${source}`);
  if (fs.existsSync(dest)) throw new Error(`${dest} already exists; choose another name`);
  fs.mkdirSync(path.dirname(dest), { recursive: true });
  const db = await open(source, sqlite3.OPEN_READONLY);
  try {
    await copyPages(db, dest, true);
  } finally {
    await close(db);
  }
}

/** Replace the contents of database `target` with the backup file `source` (through SQLite locking). */
export async function restoreDatabase(source: string, target: string): Promise<void> {
  const db = await open(target, sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE);
  try {
    await copyPages(db, source, false);
    await all(db, 'PRAGMA wal_checkpoint(TRUNCATE)');
  } finally {
    await close(db);
  }
}

/** Row count of every table of a database file (used to compare before/after). */
export async function rowCounts(file: string): Promise<Record<string, number>> {
  const db = await open(file, sqlite3.OPEN_READONLY);
  try {
    const tables = await all<{ name: string }>(db, "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name");
    const out: Record<string, number> = {};
    for (const { name } of tables) out[name] = (await all<{ n: number }>(db, `SELECT COUNT(*) AS n FROM "${name}"`))[0].n;
    return out;
  } finally {
    await close(db);
  }
}

/** A timestamp usable in file names: 2026-12-02T05-10-00Z. */
export function fileStamp(d = new Date()): string {
  return d.toISOString().replace(/\.\d+Z$/, 'Z').replace(/:/g, '-');
}
