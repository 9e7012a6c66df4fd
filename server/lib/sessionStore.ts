/** Session store: connect-sqlite3 over its own SQLite file in the data folder (WAL). */
import path from 'node:path';
import sqlite3 from 'sqlite3';
import session from 'express-session';
import connectSqlite3 from 'connect-sqlite3';

/** The store, a way to end a user's other sessions, and a function that closes its database. */
export interface SessionStoreHandle {
  store: session.Store;
  /** Delete every stored session of `userId` except `keepSid`. */
  endOtherSessions(userId: number, keepSid: string): Promise<void>;
  close(): Promise<void>;
}

/** Least milliseconds between two expiry updates of one session: a 14-day session need not be re-dated on every request. */
export const TOUCH_INTERVAL_MS = 60_000;

/**
 * express-session touches the store on every request of an unchanged session (one UPDATE and one disk
 * sync each). Touch a session at most once per TOUCH_INTERVAL_MS; expiry moves at most that much earlier.
 */
export function throttleTouches(store: session.Store, now: () => number = Date.now): void {
  const touch = store.touch?.bind(store);
  if (!touch) return;
  const last = new Map<string, number>();
  store.touch = (sid, sess, done) => {
    const t = now();
    if (t - (last.get(sid) ?? -Infinity) < TOUCH_INTERVAL_MS) return done?.();
    if (last.size > 10_000) for (const [k, at] of last) if (t - at >= TOUCH_INTERVAL_MS) last.delete(k);
    last.set(sid, t);
    touch(sid, sess, done);
  };
}

/** Open `<dataDir>/sessions.sqlite` as an express-session store. */
export function openSessionStore(dataDir: string): SessionStoreHandle {
  const SQLiteStore = connectSqlite3(session);
  const db = new sqlite3.Database(path.join(dataDir, 'sessions.sqlite'));
  db.configure('busyTimeout', 5000);
  const store = new SQLiteStore({ db: db as unknown as string, concurrentDb: 'true' } as never) as unknown as session.Store;
  throttleTouches(store);
  return {
    store,
    endOtherSessions: (userId, keepSid) =>
      new Promise<void>((resolve, reject) =>
        db.run("DELETE FROM sessions WHERE json_extract(sess, '$.userId') = ? AND sid <> ?", [userId, keepSid], (err) =>
          err ? reject(err) : resolve(),
        ),
      ),
    close: () => new Promise<void>((resolve) => db.close(() => resolve())),
  };
}
