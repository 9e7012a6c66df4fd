/** The Sequelize instance over one SQLite file: WAL journal, foreign keys on, busy timeout, immediate transactions. */
import path from 'node:path';
import fs from 'node:fs';
import sqlite3 from 'sqlite3';
import { Sequelize, Transaction } from 'sequelize';
import { queueWriteTransactions } from './writeQueue';

/** Milliseconds a connection waits for another writer before SQLITE_BUSY. */
export const BUSY_TIMEOUT_MS = 5000;

/** sqlite3 Database that sets the busy timeout on every connection Sequelize opens. */
class BusyTimeoutDatabase extends sqlite3.Database {
  constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
    super(filename, mode ?? sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE, callback);
    this.configure('busyTimeout', BUSY_TIMEOUT_MS);
  }
}

/** Open (creating if needed) `<dataDir>/heatloom.sqlite` and switch it to WAL mode. */
export async function openDatabase(dataDir: string): Promise<Sequelize> {
  fs.mkdirSync(dataDir, { recursive: true });
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    storage: path.join(dataDir, 'heatloom.sqlite'),
    dialectModule: { ...sqlite3, Database: BusyTimeoutDatabase },
    logging: false,
    transactionType: Transaction.TYPES.IMMEDIATE,
    define: { underscored: true },
  });
  queueWriteTransactions(sequelize);
  await sequelize.query('PRAGMA journal_mode=WAL');
  await sequelize.query('PRAGMA foreign_keys=ON');
  return sequelize;
}
