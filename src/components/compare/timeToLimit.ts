/**
 * Time to limit for the compare table (physics.md §3, the engine's timing answers): every part runs at
 * the chosen scenario's powers, starting from the steady state of the scenario's profile start (or
 * ambient). Only nodes whose steady temperature in that scenario exceeds their limit can cross it, so
 * only those are asked; the shortest crossing time wins. The impedance and its Foster fit run on the
 * transient worker.
 */
import type { Model } from '@shared/schemas/model';
import type { AssemblyResult } from '@shared/engine/assembly/result';
import type { TimingRequest } from '@shared/engine/transient';
import type { JobRunner } from '@/components/timeline/jobRunner';
import { scenarioNodePowers, timelineNodes, toSourcePowers } from '@/components/timeline/nodes';
import type { TimeToLimit } from './metrics';

/** Impedance output times (the Timeline's default count keeps the fit honest; fewer would be faster). */
export const COMPARE_IMPEDANCE_TIMES = 40;

/** Nodes (timeline order) whose steady mean temperature in `result` exceeds their limit. */
export function nodesOverLimit(model: Model, result: AssemblyResult): number[] {
  return timelineNodes(model).flatMap((n) => {
    const p = result.parts.find((q) => q.id === n.partId);
    if (!p || n.limit === null) return [];
    const t = n.tier === 0 ? p.junction : p.tiers[n.tier - 1]?.temperature;
    return t !== undefined && t > n.limit ? [n.index] : [];
  });
}

/** The start scenario of `scenarioId`'s profile, if it names another scenario of the model. */
export function startScenario(model: Model, scenarioId: string) {
  const from = model.scenarios.find((s) => s.id === scenarioId)?.profile?.startFrom;
  return from && from !== 'ambient' ? model.scenarios.find((s) => s.id === from) : undefined;
}

/** Engine requests, one per node that can cross its limit. */
export function timingRequests(model: Model, scenarioId: string, result: AssemblyResult): TimingRequest[] {
  const nodes = timelineNodes(model);
  const scenario = model.scenarios.find((s) => s.id === scenarioId);
  const start = startScenario(model, scenarioId);
  const on = toSourcePowers(model, scenarioNodePowers(model, scenario));
  const base = start ? toSourcePowers(model, scenarioNodePowers(model, start)) : on.map(() => 0);
  return nodesOverLimit(model, result).map((i) => ({
    node: i, limit: nodes[i].limit!, boostPower: on, restPower: base, start: start ? { steadyPower: base } : 'ambient',
  }));
}

/** Shortest time to a limit for one variant (null time = no node crosses), computed on `runner`. */
export async function timeToLimit(runner: JobRunner, model: Model, scenarioId: string, result: AssemblyResult): Promise<TimeToLimit> {
  const requests = timingRequests(model, scenarioId, result);
  if (!requests.length) return { time: null, part: '' };
  const imp = (await runner.run({ kind: 'impedance', model, count: COMPARE_IMPEDANCE_TIMES })).result;
  const nodes = timelineNodes(model);
  let best: TimeToLimit = { time: null, part: '' };
  for (const request of requests) {
    const a = (await runner.run({ kind: 'timing', params: { network: imp.network, baseTemperatures: imp.baseTemperatures, request } })).result;
    const t = a.boost.time;
    if (t !== null && (best.time === null || t < best.time)) best = { time: t, part: nodes[request.node].label };
  }
  return best;
}
