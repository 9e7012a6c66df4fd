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
  const r = await StoredResultModel.findOne({ where: { variantId, kind, inputHash }, attributes: ['result', 'createdAt'] });
  return r ? { result: JSON.parse(r.result), createdAt: r.createdAt } : null;
}

/** A stored result as JSON text (answers pass it through unparsed); `maps` is null when not asked for or not kept. */
export interface StoredText {
  text: string;
  maps: string | null;
  createdAt: Date;
}

/** The stored result of (variant, kind, inputHash) as text, or null; the maps column is read only when `withMaps`. */
export async function findResultText(variantId: number, kind: string, inputHash: string, withMaps: boolean): Promise<StoredText | null> {
  const r = await StoredResultModel.findOne({
    where: { variantId, kind, inputHash },
    attributes: withMaps ? ['result', 'maps', 'createdAt'] : ['result', 'createdAt'],
  });
  return r ? { text: r.result, maps: withMaps ? r.maps : null, createdAt: r.createdAt } : null;
}

/**
 * Store a result given as JSON text, with its plane maps apart (null when not computed). A concurrent
 * identical store keeps the first row and only adds maps it lacks; `created` says whether this call made the row.
 */
export async function storeResultText(
  variantId: number, kind: string, inputHash: string, text: string, maps: string | null, transaction: Transaction,
): Promise<{ createdAt: Date; created: boolean }> {
  // Write transactions are IMMEDIATE (one writer at a time), so a look-up then an insert cannot race.
  const found = await StoredResultModel.findOne({ where: { variantId, kind, inputHash }, attributes: ['id', 'createdAt'], transaction });
  if (found) {
    if (maps !== null) await StoredResultModel.update({ maps }, { where: { id: found.id, maps: null }, transaction });
    return { createdAt: found.createdAt, created: false };
  }
  const row = await StoredResultModel.create({ variantId, kind, inputHash, result: text, maps }, { transaction });
  return { createdAt: row.createdAt, created: true };
}

/** Add plane maps to a stored result that was kept without them. */
export async function storeMaps(variantId: number, kind: string, inputHash: string, maps: string): Promise<void> {
  await StoredResultModel.update({ maps }, { where: { variantId, kind, inputHash, maps: null } });
}

/** Store a result (serialised here; no separate maps). */
export async function storeResult(variantId: number, kind: string, inputHash: string, result: unknown, transaction: Transaction): Promise<Date> {
  return (await storeResultText(variantId, kind, inputHash, JSON.stringify(result), null, transaction)).createdAt;
}

/** Run `fn` in one transaction. */
export function inTransaction<T>(fn: (t: Transaction) => Promise<T>): Promise<T> {
  return StoredResultModel.sequelize!.transaction(fn);
}
