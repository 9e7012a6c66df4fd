/** Stored transient analyses of a variant: a scenario's timeline and the timing answers, once per input hash. */
import type { Model } from '@shared/schemas/model';
import type { TimelineRequest, TimingRequest } from '@shared/schemas/transient';
import type { Access } from '../../lib/permissions';
import { ValidationError } from '../../lib/errors';
import { sha256 } from '../../lib/tokens';
import { runEngineTask } from '../../lib/workerPool';
import { recordActivity } from '../activity/activityRepository';
import { current, ENGINE_KEY, scenarioOf } from '../solve/solveService';
import * as repo from '../solve/solveRepository';
import type { EngineTask } from '../../workers/taskTypes';

/** A stored transient result with what it was computed from. */
export interface StoredTransient {
  variantId: number;
  version: number;
  kind: string;
  inputHash: string;
  cached: boolean;
  createdAt: string;
  result: unknown;
}

function needsHeatCapacity(model: Model): void {
  const layers = [...model.stack.lid.layers, ...model.stack.interposer.layers, model.stack.c4, ...model.stack.substrate.layers];
  if (layers.some((l) => l.rho === undefined || l.cp === undefined)) {
    throw new ValidationError([{ path: 'model.stack', message: 'a transient needs density ρ and heat capacity c_p on every layer of the stack-up' }]);
  }
}

async function storedOrRun(a: Access, id: number, kind: string, params: object, task: (m: Model) => EngineTask, label: string): Promise<StoredTransient> {
  const v = await current(id);
  needsHeatCapacity(v.model);
  const hash = sha256(JSON.stringify({ engine: ENGINE_KEY, kind, params, model: v.model }));
  const base = { variantId: id, version: v.version, kind, inputHash: hash };
  const stored = await repo.findResult(id, kind, hash);
  if (stored) return { ...base, cached: true, createdAt: stored.createdAt.toISOString(), result: stored.result };
  const result = await runEngineTask<unknown>(task(v.model));
  const createdAt = await repo.inTransaction(async (t) => {
    const at = await repo.storeResult(id, kind, hash, result, t);
    await recordActivity({ projectId: a.projectId!, variantId: id, actorId: a.userId, kind: 'analysis.stored', summary: `"${v.name}" version ${v.version}: ${label}` }, t);
    return at;
  });
  return { ...base, cached: false, createdAt: createdAt.toISOString(), result: JSON.parse(JSON.stringify(result)) };
}

/** Temperature versus time of the scenario's power profile (stored per model, scenario and feedback choice). */
export async function variantTimeline(a: Access, id: number, body: TimelineRequest): Promise<StoredTransient> {
  const v = await current(id);
  const scenarioId = scenarioOf(v.model, body.scenarioId);
  return storedOrRun(a, id, 'transient-timeline', { scenarioId, feedback: body.feedback }, (model) => ({ kind: 'timeline', model, scenarioId, feedback: body.feedback }), `timeline of scenario "${scenarioId}"`);
}

/** Time to limit, rest time and duty cycle for one part (stored per model and request). */
export async function variantTiming(a: Access, id: number, body: TimingRequest): Promise<StoredTransient> {
  const v = await current(id);
  const scenarioId = scenarioOf(v.model, body.scenarioId);
  if (!v.model.parts.some((p) => p.id === body.partId)) throw new ValidationError([{ path: 'partId', message: `no part "${body.partId}" in this variant` }]);
  if (body.startFrom && body.startFrom !== 'ambient') scenarioOf(v.model, body.startFrom);
  const request = { ...body, scenarioId };
  // `meaning` 2: the others rest at the start scenario's powers (as on the Timeline screen); answers stored under meaning 1 are not reused.
  return storedOrRun(a, id, 'transient-timing', { ...request, meaning: 2 }, (model) => ({ kind: 'timing', model, request }), `timing answers for "${body.partId}"`);
}
