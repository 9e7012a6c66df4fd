/** Stored analyses: solve one scenario of a variant's current model once per (model, scenario, engine version). */
import type { AssemblyResult } from '@shared/engine';
import type { Model } from '@shared/schemas/model';
import type { StoredResult } from '@shared/schemas/solve';
import pkg from '../../../package.json';
import type { Access } from '../../lib/permissions';
import { NotFoundError, ValidationError } from '../../lib/errors';
import { sha256 } from '../../lib/tokens';
import { recordActivity } from '../activity/activityRepository';
import { findVariant } from '../variants/variantsRepository';
import * as repo from './solveRepository';
import { runEngineTask } from '../../lib/workerPool';

/** Result kind of the steady assembly solve. */
export const ASSEMBLY_KIND = 'assembly-steady';
/** Engine identity in the cache key: results are recomputed after an upgrade. */
export const ENGINE_KEY = `heatloom-engine@${pkg.version}`;

/** The variant's current model, version and name (404 when unknown). */
export async function current(id: number): Promise<{ model: Model; version: number; name: string }> {
  const v = await findVariant(id);
  if (!v) throw new NotFoundError('Variant');
  return { model: JSON.parse(v.model) as Model, version: v.version, name: v.name };
}

/** The scenario id to use (the model's first when absent); 400 naming the choices when unknown. */
export function scenarioOf(model: Model, scenarioId?: string): string {
  const id = scenarioId ?? model.scenarios[0].id;
  if (!model.scenarios.some((s) => s.id === id)) {
    throw new ValidationError([{ path: 'scenarioId', message: `no scenario "${id}" (this variant has: ${model.scenarios.map((s) => s.id).join(', ')})` }]);
  }
  return id;
}

/** Hash of everything the result depends on. */
export function inputHash(model: Model, scenarioId: string): string {
  return sha256(JSON.stringify({ engine: ENGINE_KEY, kind: ASSEMBLY_KIND, scenarioId, model }));
}

/** A stored result whose engine output is kept as JSON text, so a cached answer is never parsed and re-serialised. */
export interface StoredAnswer {
  meta: Omit<StoredResult, 'result'>;
  resultJson: string;
}

/** The answer's JSON body: the metadata with the stored result text spliced in. */
export function answerJson(a: StoredAnswer): string {
  return `${JSON.stringify(a.meta).slice(0, -1)},"result":${a.resultJson}}`;
}

/** Solve (or reuse) one scenario of the variant's current version. */
export async function solveVariant(a: Access, id: number, scenarioId?: string): Promise<StoredAnswer> {
  const v = await current(id);
  const sid = scenarioOf(v.model, scenarioId);
  const hash = inputHash(v.model, sid);
  const base = { variantId: id, version: v.version, scenarioId: sid, kind: ASSEMBLY_KIND, inputHash: hash };
  const stored = await repo.findResultText(id, ASSEMBLY_KIND, hash);
  if (stored) return { meta: { ...base, cached: true, createdAt: stored.createdAt.toISOString() }, resultJson: stored.text };
  const result = await runEngineTask<AssemblyResult>({ kind: 'assembly', model: v.model, scenarioId: sid });
  const createdAt = await repo.inTransaction(async (t) => {
    const at = await repo.storeResult(id, ASSEMBLY_KIND, hash, result, t);
    await recordActivity({ projectId: a.projectId!, variantId: id, actorId: a.userId, kind: 'analysis.stored', summary: `"${v.name}" version ${v.version}: solved scenario "${sid}"` }, t);
    return at;
  });
  return { meta: { ...base, cached: false, createdAt: createdAt.toISOString() }, resultJson: JSON.stringify(result) };
}

/** The stored result for the variant's current version, or 404 when it has not been solved. */
export async function storedVariantResult(id: number, scenarioId?: string): Promise<StoredAnswer> {
  const v = await current(id);
  const sid = scenarioOf(v.model, scenarioId);
  const hash = inputHash(v.model, sid);
  const stored = await repo.findResultText(id, ASSEMBLY_KIND, hash);
  if (!stored) throw new NotFoundError('Stored result');
  return {
    meta: { variantId: id, version: v.version, scenarioId: sid, kind: ASSEMBLY_KIND, inputHash: hash, cached: true, createdAt: stored.createdAt.toISOString() },
    resultJson: stored.text,
  };
}
