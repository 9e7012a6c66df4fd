/** Queued write transactions: one at a time, on one shared connection; a failed one leaves nothing behind and the next gets a fresh connection. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../../server/db/sequelize';

let db: Sequelize;
let dir: string;
beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-queue-'));
  db = await openDatabase(dir);
  await db.query('CREATE TABLE marks (id INTEGER PRIMARY KEY, n INTEGER NOT NULL)');
});
afterAll(async () => {
  await db.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

const connectionOf = (t: Transaction) => (t as unknown as { connection: unknown }).connection;
const insert = (n: number, t: Transaction) => db.query('INSERT INTO marks (n) VALUES (?)', { replacements: [n], transaction: t });
const count = async (n: number) => (await db.query<{ c: number }>('SELECT COUNT(*) AS c FROM marks WHERE n = ?', { replacements: [n], type: QueryTypes.SELECT }))[0].c;

describe('queued write transactions (own invariants)', () => {
  it('run one at a time on one shared connection, however many are asked for at once', async () => {
    const seen = new Set<unknown>();
    let open = 0;
    let most = 0;
    await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        db.transaction(async (t) => {
          open++;
          most = Math.max(most, open);
          seen.add(connectionOf(t));
          await insert(1000 + i, t);
          await new Promise((r) => setTimeout(r, 1));
          open--;
        }),
      ),
    );
    expect(most).toBe(1);
    expect(seen.size).toBe(1);
    expect((await db.query<{ c: number }>('SELECT COUNT(*) AS c FROM marks WHERE n >= 1000', { type: QueryTypes.SELECT }))[0].c).toBe(20);
  });

  it('a failed transaction is rolled back and the next one gets a fresh connection that works', async () => {
    let before: unknown;
    await db.transaction(async (t) => void (before = connectionOf(t)));
    await expect(db.transaction(async (t) => {
      await insert(7, t);
      throw new Error('fails after a write');
    })).rejects.toThrow('fails after a write');
    expect(await count(7)).toBe(0);
    let after: unknown;
    await db.transaction(async (t) => {
      after = connectionOf(t);
      await insert(8, t);
    });
    expect(after).not.toBe(before);
    expect(await count(8)).toBe(1);
  });

  it('a transaction that commits and reopens its own transaction inside is still rolled back on failure; the next one works', async () => {
    await expect(db.transaction(async (t) => {
      await insert(9, t);
      await db.query('COMMIT', { transaction: t });
      await db.query('BEGIN', { transaction: t });
      await insert(10, t);
      throw new Error('left a transaction open');
    })).rejects.toThrow('left a transaction open');
    expect(await count(10)).toBe(0);
    await db.transaction(async (t) => insert(11, t));
    expect(await count(11)).toBe(1);
  });
});
