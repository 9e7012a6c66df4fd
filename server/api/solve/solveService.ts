/** Stored analyses: solve one scenario of a variant's current model once per (model, scenario, engine version). */
import type { AssemblyResult } from '@shared/engine/assembly/result';
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
import type { AssemblyTexts } from '../../workers/taskTypes';

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
  /** The result without its plane maps, as JSON text. */
  resultJson: string;
  /** The plane maps as JSON text, or null when left out of the answer. */
  mapsJson: string | null;
}

/** The answer's JSON body: the metadata with the stored result text spliced in (its `maps` member last; null when left out). */
export function answerJson(a: StoredAnswer): string {
  return `${JSON.stringify(a.meta).slice(0, -1)},"result":${a.resultJson.slice(0, -1)},"maps":${a.mapsJson ?? 'null'}}}`;
}

/** Engine runs in progress by variant, input hash and what they produce: identical requests at the same time share one run. */
const inFlight = new Map<string, Promise<unknown>>();

function shared<T>(key: string, run: () => Promise<T>): Promise<T> {
  let p = inFlight.get(key) as Promise<T> | undefined;
  if (!p) {
    p = run().finally(() => inFlight.delete(key));
    inFlight.set(key, p);
  }
  return p;
}

type Current = Awaited<ReturnType<typeof current>>;

/** The answer's metadata for one scenario of the current version. */
function answerMeta(id: number, v: Current, sid: string, hash: string, withMaps: boolean, cached: boolean, createdAt: Date): StoredAnswer['meta'] {
  return { variantId: id, version: v.version, scenarioId: sid, kind: ASSEMBLY_KIND, inputHash: hash, mapsIncluded: withMaps, cached, createdAt: createdAt.toISOString() };
}

/** Run the engine for this model and scenario and store the result (with its maps when `withMaps`); activity is recorded when the row is new. */
function computeAndStore(a: Access, id: number, v: Current, sid: string, hash: string, withMaps: boolean) {
  return shared(`${id}:${hash}:${withMaps}`, async () => {
    const texts = await runEngineTask<AssemblyTexts>({ kind: 'assembly', model: v.model, scenarioId: sid, maps: withMaps });
    const createdAt = await repo.inTransaction(async (t) => {
      const stored = await repo.storeResultText(id, ASSEMBLY_KIND, hash, texts.summary, texts.maps, t);
      if (stored.created) {
        await recordActivity({ projectId: a.projectId!, variantId: id, actorId: a.userId, kind: 'analysis.stored', summary: `"${v.name}" version ${v.version}: solved scenario "${sid}"` }, t);
      }
      return stored.createdAt;
    });
    return { createdAt, ...texts };
  });
}

/** The plane maps of a result stored without them: the engine runs again (same inputs, same answer) and the maps are kept. */
function addMaps(id: number, v: Current, sid: string, hash: string): Promise<string> {
  return shared(`${id}:${hash}:maps`, async () => {
    const { maps } = await runEngineTask<AssemblyTexts>({ kind: 'assembly', model: v.model, scenarioId: sid, maps: true });
    await repo.storeMaps(id, ASSEMBLY_KIND, hash, maps!);
    return maps!;
  });
}

/** The stored answer of the current version, with maps added on demand; null when it was never solved. */
async function storedAnswer(id: number, v: Current, sid: string, hash: string, withMaps: boolean): Promise<StoredAnswer | null> {
  const stored = await repo.findResultText(id, ASSEMBLY_KIND, hash, withMaps);
  if (!stored) return null;
  const mapsJson = withMaps ? (stored.maps ?? (await addMaps(id, v, sid, hash))) : null;
  return { meta: answerMeta(id, v, sid, hash, withMaps, true, stored.createdAt), resultJson: stored.text, mapsJson };
}

/** Solve (or reuse) one scenario of the variant's current version; the plane maps only when `withMaps`. */
export async function solveVariant(a: Access, id: number, scenarioId?: string, withMaps = false): Promise<StoredAnswer> {
  const v = await current(id);
  const sid = scenarioOf(v.model, scenarioId);
  const hash = inputHash(v.model, sid);
  const stored = await storedAnswer(id, v, sid, hash, withMaps);
  if (stored) return stored;
  const fresh = await computeAndStore(a, id, v, sid, hash, withMaps);
  return { meta: answerMeta(id, v, sid, hash, withMaps, false, fresh.createdAt), resultJson: fresh.summary, mapsJson: withMaps ? fresh.maps : null };
}

/**
 * A scenario's result without plane maps, for exports: the stored one when this model and scenario were
 * solved before (so exports and solve answers agree to the last digit), else computed on a worker thread
 * and not stored (an export needs only read access; storing is for those who run analyses).
 */
export async function resultForExport(id: number, model: Model, scenarioId?: string): Promise<AssemblyResult> {
  const sid = scenarioOf(model, scenarioId);
  const stored = await repo.findResultText(id, ASSEMBLY_KIND, inputHash(model, sid), false);
  const text = stored?.text ?? (await runEngineTask<AssemblyTexts>({ kind: 'assembly', model, scenarioId: sid, maps: false })).summary;
  return { ...(JSON.parse(text) as Omit<AssemblyResult, 'maps'>), maps: null } as unknown as AssemblyResult;
}

/** The stored result for the variant's current version (plane maps only when `withMaps`), or 404 when it has not been solved. */
export async function storedVariantResult(id: number, scenarioId?: string, withMaps = false): Promise<StoredAnswer> {
  const v = await current(id);
  const sid = scenarioOf(v.model, scenarioId);
  const stored = await storedAnswer(id, v, sid, inputHash(v.model, sid), withMaps);
  if (!stored) throw new NotFoundError('Stored result');
  return stored;
}
