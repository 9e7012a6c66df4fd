/** Variants: the model document with an optimistic version, its history and review status. */
import type { Transaction } from 'sequelize';
import type { Model } from '@shared/schemas/model';
import type { VariantStatus, VariantSummary, VariantVersion } from '@shared/schemas/variants';
import { UserModel } from '../../db/models/accounts';
import { VariantModel, VariantVersionModel } from '../../db/models/designs';
import { recordActivity, type NewActivity } from '../activity/activityRepository';
import { toSummary, toVersion } from './variantsMapper';

const withEditor = [{ model: UserModel, as: 'updatedBy', attributes: ['id', 'name'] }];

/** Run `fn` in one transaction. */
export function inTransaction<T>(fn: (t: Transaction) => Promise<T>): Promise<T> {
  return VariantModel.sequelize!.transaction(fn);
}

/** Variants of an assembly, oldest first. */
export async function listVariants(assemblyId: number): Promise<VariantSummary[]> {
  return (await VariantModel.findAll({ where: { assemblyId }, include: withEditor, order: [['id', 'ASC']] })).map(toSummary);
}

/** One variant row (with its last editor). */
export function findVariant(id: number, transaction?: Transaction): Promise<VariantModel | null> {
  return VariantModel.findByPk(id, { include: withEditor, transaction });
}

/** The first variant of an assembly (template for a new one). */
export function firstVariant(assemblyId: number): Promise<VariantModel | null> {
  return VariantModel.findOne({ where: { assemblyId }, order: [['id', 'ASC']] });
}

/** Insert a variant at version 1 with its first history entry and an activity event. */
export async function insertVariant(
  data: { assemblyId: number; name: string; note: string; model: Model; userId: number }, activity: Omit<NewActivity, 'variantId'>, t: Transaction,
): Promise<number> {
  const model = JSON.stringify(data.model);
  const v = await VariantModel.create(
    { assemblyId: data.assemblyId, name: data.name, note: data.note, status: 'draft', model, version: 1, updatedById: data.userId }, { transaction: t },
  );
  await VariantVersionModel.create({ variantId: v.id, version: 1, model, summary: activity.summary, savedById: data.userId }, { transaction: t });
  await recordActivity({ ...activity, variantId: v.id }, t);
  return v.id;
}

/**
 * Write a new model if the stored version still equals `expected`; also appends the history
 * entry. Returns false (nothing written) when the version moved on.
 */
export async function writeModel(
  id: number, expected: number, change: { model: Model; name?: string; note?: string; status?: VariantStatus; userId: number; summary: string }, t: Transaction,
): Promise<boolean> {
  const model = JSON.stringify(change.model);
  const fields: Record<string, unknown> = { model, version: expected + 1, updatedById: change.userId };
  if (change.name !== undefined) fields.name = change.name;
  if (change.note !== undefined) fields.note = change.note;
  if (change.status !== undefined) fields.status = change.status;
  const [n] = await VariantModel.update(fields, { where: { id, version: expected }, transaction: t });
  if (n !== 1) return false;
  await VariantVersionModel.create({ variantId: id, version: expected + 1, model, summary: change.summary, savedById: change.userId }, { transaction: t });
  return true;
}

/** Set the status if it still is `from`; false when it changed meanwhile. */
export async function writeStatus(id: number, from: VariantStatus, to: VariantStatus, userId: number, t: Transaction): Promise<boolean> {
  const [n] = await VariantModel.update({ status: to, updatedById: userId }, { where: { id, status: from }, transaction: t });
  return n === 1;
}

/** Delete a variant (history, comments and results cascade). */
export async function deleteVariant(id: number): Promise<void> {
  await VariantModel.destroy({ where: { id } });
}

/** A variant's history, newest first. */
export async function listVersions(variantId: number): Promise<VariantVersion[]> {
  const rows = await VariantVersionModel.findAll({
    where: { variantId },
    include: [{ model: UserModel, as: 'savedBy', attributes: ['id', 'name'] }],
    order: [['version', 'DESC']],
    attributes: { exclude: ['model'] },
  });
  return rows.map(toVersion);
}

/** History entry `n` with its model, or null. */
export async function findVersion(variantId: number, n: number): Promise<(VariantVersion & { model: Model }) | null> {
  const h = await VariantVersionModel.findOne({
    where: { variantId, version: n }, include: [{ model: UserModel, as: 'savedBy', attributes: ['id', 'name'] }],
  });
  return h ? { ...toVersion(h), model: JSON.parse(h.model) as Model } : null;
}

/** The model saved as version `n`, or null. */
export async function versionModel(variantId: number, n: number, t?: Transaction): Promise<Model | null> {
  const h = await VariantVersionModel.findOne({ where: { variantId, version: n }, transaction: t });
  return h ? (JSON.parse(h.model) as Model) : null;
}
