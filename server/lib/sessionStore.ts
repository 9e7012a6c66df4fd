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

/** Open `<dataDir>/sessions.sqlite` as an express-session store. */
export function openSessionStore(dataDir: string): SessionStoreHandle {
  const SQLiteStore = connectSqlite3(session);
  const db = new sqlite3.Database(path.join(dataDir, 'sessions.sqlite'));
  db.configure('busyTimeout', 5000);
  const store = new SQLiteStore({ db: db as unknown as string, concurrentDb: 'true' } as never) as unknown as session.Store;
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
