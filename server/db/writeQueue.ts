/**
 * One write transaction at a time, queued in JavaScript. SQLite allows a single writer; with
 * node-sqlite3 each waiting `BEGIN IMMEDIATE` sleeps in SQLite's busy handler on a libuv pool
 * thread (4 by default), so a few waiting writers can take every pool thread and leave the lock
 * holder unable to run its COMMIT until their busy timeouts expire (seen under load: ~26 s waits
 * with an idle CPU, then SQLITE_BUSY). Queueing the transactions here keeps pool threads free.
 *
 * Because they run one at a time, the queued transactions also share one long-lived SQLite
 * connection: Sequelize otherwise opens a connection for every transaction (file, WAL index,
 * schema parse on the first statement) and closes it afterwards. A transaction that fails in any
 * way may have left that connection inside a transaction, so it is closed (SQLite rolls back
 * whatever is open) and the next transaction opens a fresh one.
 */
import type { Sequelize, Transaction, TransactionOptions } from 'sequelize';

type TransactionFn = Sequelize['transaction'];

/** The parts of Sequelize's SQLite connection manager used here (not in its public typings). */
interface ConnectionManager {
  getConnection(options?: { uuid?: string }): Promise<unknown>;
  releaseConnection(connection: unknown, force?: boolean): unknown;
}
interface Closable {
  close(cb?: (err: Error | null) => void): void;
}

/** Serve every transaction connection request from one shared connection while it is free; `discard` drops it. */
function shareTransactionConnection(sequelize: Sequelize): { discard(): Promise<void> } {
  const manager = (sequelize as unknown as { connectionManager: ConnectionManager }).connectionManager;
  const get = manager.getConnection.bind(manager);
  const release = manager.releaseConnection.bind(manager);
  let shared: unknown = null;
  let busy = false;
  manager.getConnection = async (options) => {
    // 'default' serves statements outside transactions; a second transaction at once (not queued) gets its own.
    if (!options?.uuid || options.uuid === 'default' || busy) return get(options);
    busy = true;
    try {
      shared ??= await get({ ...options, uuid: 'queued-transactions' });
    } catch (err) {
      busy = false;
      throw err;
    }
    return shared;
  };
  manager.releaseConnection = (connection, force) => {
    if (connection !== null && connection === shared) {
      busy = false;
      return undefined;
    }
    return release(connection, force);
  };
  return {
    discard: async () => {
      const c = shared as Closable | null;
      shared = null;
      busy = false;
      delete (manager as unknown as { connections: Record<string, unknown> }).connections['queued-transactions'];
      if (c) await new Promise<void>((resolve) => c.close(() => resolve()));
    },
  };
}

/** Make `sequelize.transaction(fn)` wait for the previous top-level transaction; nested ones (savepoints) pass straight through. */
export function queueWriteTransactions(sequelize: Sequelize): void {
  const original = sequelize.transaction.bind(sequelize) as (o?: TransactionOptions, fn?: (t: Transaction) => Promise<unknown>) => Promise<unknown>;
  const connection = shareTransactionConnection(sequelize);
  let tail: Promise<unknown> = Promise.resolve();
  const queued = (options?: unknown, fn?: unknown): Promise<unknown> => {
    const [opts, cb] = typeof options === 'function' ? [undefined, options] : [options as TransactionOptions | undefined, fn];
    if (typeof cb !== 'function' || opts?.transaction) return original(opts, cb as never);
    const run = tail.then(() => original(opts, cb as (t: Transaction) => Promise<unknown>));
    tail = run.catch(() => connection.discard());
    return run;
  };
  sequelize.transaction = queued as TransactionFn;
}
