/** Session store: connect-sqlite3 over its own SQLite file in the data folder (WAL). */
import path from 'node:path';
import sqlite3 from 'sqlite3';
import session from 'express-session';
import connectSqlite3 from 'connect-sqlite3';

/** The store and a function that closes its database. */
export interface SessionStoreHandle {
  store: session.Store;
  close(): Promise<void>;
}

/** Open `<dataDir>/sessions.sqlite` as an express-session store. */
export function openSessionStore(dataDir: string): SessionStoreHandle {
  const SQLiteStore = connectSqlite3(session);
  const db = new sqlite3.Database(path.join(dataDir, 'sessions.sqlite'));
  db.configure('busyTimeout', 5000);
  const store = new SQLiteStore({ db: db as unknown as string, concurrentDb: 'true' } as never) as unknown as session.Store;
  return { store, close: () => new Promise<void>((resolve) => db.close(() => resolve())) };
}
