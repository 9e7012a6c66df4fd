/**
 * Storage failures (disk full, read-only or vanished data folder, a lock held past the busy
 * timeout) → a clear 507/503 instead of a generic 500. SQLite rolls the transaction back, so
 * nothing half-written stays behind (https://www.sqlite.org/atomiccommit.html); the message tells the user the change was not saved.
 */
import type { ErrorRequestHandler } from 'express';
import fs from 'node:fs';
import path from 'node:path';
import { AppError } from './errors';
import type { Logger } from './logger';

const FULL = new Set(['SQLITE_FULL', 'ENOSPC', 'EFBIG', 'EDQUOT']);
const UNWRITABLE = new Set(['SQLITE_READONLY', 'SQLITE_CANTOPEN', 'SQLITE_IOERR', 'EROFS', 'EACCES', 'EPERM']);
const BUSY = new Set(['SQLITE_BUSY', 'SQLITE_LOCKED']);

/** The SQLite/POSIX code of an error or of the error it wraps (Sequelize keeps the driver's in `original`). */
export function storageCode(err: unknown): string | null {
  for (let e = err as { code?: unknown; original?: unknown; parent?: unknown } | undefined, i = 0; e && i < 4; i++) {
    if (typeof e.code === 'string' && (FULL.has(e.code) || UNWRITABLE.has(e.code) || BUSY.has(e.code))) return e.code;
    e = (e.original ?? e.parent) as typeof e;
  }
  return null;
}

/** Map a storage failure to the AppError the user sees; null when `err` is something else. */
export function storageError(err: unknown): AppError | null {
  const code = storageCode(err);
  if (!code) return null;
  if (BUSY.has(code)) return new AppError(503, 'storage_busy', 'The database stayed busy with other changes for too long: your change was not saved. Try again in a moment.');
  if (FULL.has(code)) return new AppError(507, 'storage_full', 'The server has run out of disk space: your change was not saved. Ask the administrator to free space, then try again.');
  return new AppError(503, 'storage_unavailable', 'The server cannot write to its data folder (read-only or unavailable): your change was not saved. Ask the administrator to check the data folder.');
}

/** Error middleware placed before the main one: turns storage failures into typed errors (and logs them once). */
export function storageErrors(logger: Logger): ErrorRequestHandler {
  return (err, _req, _res, next) => {
    const mapped = storageError(err);
    if (mapped) logger.error(`Storage failure (${storageCode(err)}): ${(err as Error).message}`);
    next(mapped ?? err);
  };
}

/** Check at start that `dataDir` is a writable folder; throws a readable error naming the folder and the cause. */
export function assertWritableDataDir(dataDir: string): void {
  const probe = path.join(dataDir, `.write-check-${process.pid}`);
  try {
    fs.mkdirSync(dataDir, { recursive: true });
    const fd = fs.openSync(probe, 'w');
    try {
      fs.writeSync(fd, 'ok');
      fs.fsyncSync(fd);
    } finally {
      fs.closeSync(fd);
    }
    fs.unlinkSync(probe);
  } catch (err) {
    const e = err as NodeJS.ErrnoException;
    const why = e.code === 'ENOTDIR' ? 'part of the path is a file, not a folder'
      : e.code === 'EROFS' ? 'the file system is read-only'
        : e.code === 'EACCES' || e.code === 'EPERM' ? 'permission denied'
          : e.code === 'ENOSPC' ? 'the disk is full'
            : e.message;
    throw new Error(`The data folder ${dataDir} cannot be written (${why}). Heatloom keeps its database there: fix the folder or set HEATLOOM_DATA_DIR to a writable one.`);
  }
}
