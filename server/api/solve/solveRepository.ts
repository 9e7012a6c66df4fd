/** Solver results stored per variant, keyed by a hash of their inputs. */
import type { Transaction } from 'sequelize';
import { StoredResultModel } from '../../db/models/records';

/** A stored result row as the service needs it. */
export interface StoredRow {
  result: unknown;
  createdAt: Date;
}

/** The stored result of (variant, kind, inputHash), or null. */
export async function findResult(variantId: number, kind: string, inputHash: string): Promise<StoredRow | null> {
  const r = await StoredResultModel.findOne({ where: { variantId, kind, inputHash } });
  return r ? { result: JSON.parse(r.result), createdAt: r.createdAt } : null;
}

/** The stored result of (variant, kind, inputHash) as its JSON text, or null (no parse: answers pass it through). */
export async function findResultText(variantId: number, kind: string, inputHash: string): Promise<{ text: string; createdAt: Date } | null> {
  const r = await StoredResultModel.findOne({ where: { variantId, kind, inputHash } });
  return r ? { text: r.result, createdAt: r.createdAt } : null;
}

/** Store a result (a concurrent identical store keeps the first). */
export async function storeResult(variantId: number, kind: string, inputHash: string, result: unknown, transaction: Transaction): Promise<Date> {
  const [row] = await StoredResultModel.findOrCreate({
    where: { variantId, kind, inputHash },
    defaults: { variantId, kind, inputHash, result: JSON.stringify(result) },
    transaction,
  });
  return row.createdAt;
}

/** Run `fn` in one transaction. */
export function inTransaction<T>(fn: (t: Transaction) => Promise<T>): Promise<T> {
  return StoredResultModel.sequelize!.transaction(fn);
}
