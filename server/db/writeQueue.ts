/**
 * One write transaction at a time, queued in JavaScript. SQLite allows a single writer; with
 * node-sqlite3 each waiting `BEGIN IMMEDIATE` sleeps in SQLite's busy handler on a libuv pool
 * thread (4 by default), so a few waiting writers can take every pool thread and leave the lock
 * holder unable to run its COMMIT until their busy timeouts expire (seen under load: ~26 s waits
 * with an idle CPU, then SQLITE_BUSY). Queueing the transactions here keeps pool threads free.
 */
import type { Sequelize, Transaction, TransactionOptions } from 'sequelize';

type TransactionFn = Sequelize['transaction'];

/** Make `sequelize.transaction(fn)` wait for the previous top-level transaction; nested ones (savepoints) pass straight through. */
export function queueWriteTransactions(sequelize: Sequelize): void {
  const original = sequelize.transaction.bind(sequelize) as (o?: TransactionOptions, fn?: (t: Transaction) => Promise<unknown>) => Promise<unknown>;
  let tail: Promise<unknown> = Promise.resolve();
  const queued = (options?: unknown, fn?: unknown): Promise<unknown> => {
    const [opts, cb] = typeof options === 'function' ? [undefined, options] : [options as TransactionOptions | undefined, fn];
    if (typeof cb !== 'function' || opts?.transaction) return original(opts, cb as never);
    const run = tail.then(() => original(opts, cb as (t: Transaction) => Promise<unknown>));
    tail = run.catch(() => undefined);
    return run;
  };
  sequelize.transaction = queued as TransactionFn;
}
