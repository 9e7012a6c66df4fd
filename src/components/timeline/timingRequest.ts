/**
 * Timing-answer inputs → the engine's request (transient/timingAnswers.ts), with the meaning the
 * stored route uses too (`modelTimingAnswers`): the chosen part runs at the boost power with the other
 * parts at the selected scenario's powers; while resting it drops to the rest power with the others at
 * the start scenario's powers; the start state is the steady state of that resting state.
 * Optionally every part's leakage and Joule heat are added as evaluated at its own limit temperature: a
 * fixed-power bound that is conservative while the part stays below its limit (physics.md §4 power law).
 */
import type { Model } from '@shared/schemas/model';
import type { TimingRequest } from '@shared/engine/transient';
import { evaluatePower } from '@shared/engine/electrothermal/powerLaw';
import { nodePowerLaws } from '@/components/electrothermal/problem';
import { scenarioNodePowers, timelineNodes, timelineSources, toSourcePowers } from './nodes';

/** What the user types (powers W, temperatures °C, period ms). */
export interface TimingInputs {
  node: number;
  boostPower: number | null;
  restPower: number | null;
  limit: number | null;
  reenable: number | null;
  periodMs: number | null;
  /** 'ambient' or a scenario id. */
  startFrom: string;
  /** Add leakage and Joule heat at each part's limit temperature. */
  withLeakage: boolean;
}

/** A request, or the first problem with the inputs in words. */
export type TimingBuild = { ok: true; request: TimingRequest } | { ok: false; message: string };

/** Build the engine request for the selected scenario. */
export function timingRequest(model: Model, scenarioId: string, inputs: TimingInputs): TimingBuild {
  const nodes = timelineNodes(model);
  const node = nodes[inputs.node];
  if (!node) return { ok: false, message: 'Choose a part.' };
  const { boostPower, restPower, limit, reenable, periodMs } = inputs;
  if (boostPower === null || !(boostPower >= 0)) return { ok: false, message: 'Enter a boost power of 0 W or more.' };
  if (restPower === null || !(restPower >= 0)) return { ok: false, message: 'Enter a rest power of 0 W or more.' };
  if (limit === null || !Number.isFinite(limit)) return { ok: false, message: 'Enter the limit in °C.' };
  if (reenable !== null && !(reenable < limit)) return { ok: false, message: `The re-enable temperature must be below the limit (${limit} °C).` };
  if (periodMs !== null && !(periodMs > 0)) return { ok: false, message: 'The period must be longer than 0 ms.' };
  const scenario = model.scenarios.find((s) => s.id === scenarioId);
  const start = inputs.startFrom === 'ambient' ? undefined : model.scenarios.find((s) => s.id === inputs.startFrom);
  const sources = timelineSources(model);
  const own = sources.findIndex((s) => s.kind === 'junction' && s.partId === node.partId);
  const on = toSourcePowers(model, scenarioNodePowers(model, scenario));
  const base = start ? toSourcePowers(model, scenarioNodePowers(model, start)) : on.map(() => 0);
  const off = [...base];
  on[own] = boostPower;
  off[own] = restPower;
  if (inputs.withLeakage) {
    const extra = (id: string | undefined) => {
      const laws = nodePowerLaws(model, model.scenarios.find((s) => s.id === id));
      return sources.map((s) => (s.kind === 'junction' ? evaluatePower({ ...laws[s.node], dynamic: 0 }, s.node === node.index ? limit : nodes[s.node].limit).total : 0));
    };
    extra(scenario?.id).forEach((p, i) => (on[i] += p));
    if (start) extra(start.id).forEach((p, i) => (off[i] += p));
  }
  const limits = nodes.map((n) => n.limit);
  limits[node.index] = limit;
  return {
    ok: true,
    request: {
      node: node.index,
      limit,
      reenable: reenable ?? undefined,
      boostPower: on,
      restPower: off,
      start: start ? { steadyPower: off } : 'ambient',
      startLabel: start ? `from ${start.name.toLowerCase()}` : 'from ambient',
      period: periodMs === null ? undefined : periodMs / 1e3,
      limits,
    },
  };
}

/** Defaults for a node: its scenario power to boost, its start-scenario power to rest, its limit, 10 K below to re-enable. */
export function defaultTimingInputs(model: Model, scenarioId: string, node: number, startFrom: string): TimingInputs {
  const n = timelineNodes(model)[node];
  const scenario = model.scenarios.find((s) => s.id === scenarioId);
  const start = model.scenarios.find((s) => s.id === startFrom);
  return {
    node,
    boostPower: scenario?.loads[n?.partId ?? '']?.power ?? 0,
    restPower: start?.loads[n?.partId ?? '']?.power ?? 0,
    limit: n?.limit ?? 105,
    reenable: (n?.limit ?? 105) - 10,
    periodMs: 100,
    startFrom,
    withLeakage: true,
  };
}
