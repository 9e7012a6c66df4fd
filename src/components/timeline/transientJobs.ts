/**
 * The transient worker's jobs as pure functions (no DOM): the assembly impedance (engine,
 * physics.md §3) and its Foster fit, profile simulation, timing answers, and the electro-thermal
 * analysis of a scenario (physics.md §4).
 */
import type { Model } from '@shared/schemas/model';
import { assemblyNetwork, type AssemblyNetwork } from '@shared/engine/assembly/network';
import type { ImpedanceCache } from '@shared/engine/cache';
import { EngineInputError } from '@shared/engine/errors';
import { analyseCoupling, solveCoupled, type CouplingResult, type NodePowerLaw } from '@shared/engine/electrothermal';
import {
  prepareLaplaceAssembly, prepareModelTransient, scheduleFromSegments, simulateProfile, timingAnswers,
  type FosterNetwork, type LongRunHooks, type SimulationResult, type SimulationStart, type TimingAnswers,
} from '@shared/engine/transient';
import { coupledProblem, nodePowerLaws } from '@/components/electrothermal/problem';
import { networkKey, scenarioNodePowers, sourceSegments, timelineNodes, timelineSources, toSourcePowers } from './nodes';
import type { ImpedanceResult, SimulateParams, TimingParams } from './protocol';

/** Impedance (rows = nodes, columns = part sources) from 1 µs to settling, with its Foster fit. */
export function impedanceJob(model: Model, count: number, hooks: LongRunHooks = {}): ImpedanceResult {
  const laplace = prepareLaplaceAssembly(model);
  const mt = prepareModelTransient(model, { ...hooks, count, laplace, sources: 'parts' });
  const imp = mt.impedance;
  const sources = timelineSources(model);
  if (imp.sourceLabels.join() !== sources.map((s) => s.key).join()) throw new Error('The engine ordered the impedance sources differently than the Timeline expects.');
  const { network, ...fit } = mt.fit;
  // Readable row names for the sentences; a stack's tiers source reads its first tier (its law has no T-dependent part).
  const labels = timelineNodes(model).map((x) => x.label);
  const sourceNodes = sources.map((s) => s.node);
  const n = laplace.nodeCount;
  const nodeSteady = Array.from({ length: n }, (_, j) => Array.from(laplace.steady.R.subarray(j * n, (j + 1) * n)));
  const method = `Stehfest inversion at ${imp.times.length} times (${imp.evaluations} Laplace evaluations)`;
  return {
    times: imp.times, Z: imp.Z, steady: imp.steady, nodeSteady, baseTemperatures: Array.from(laplace.steady.offsets),
    sourceKeys: imp.sourceLabels, settleTime: imp.settleTime, checks: imp.checks, fit, network: { ...network, labels, sourceNodes }, method,
  };
}

function scenarioOf(model: Model, id: string) {
  const s = model.scenarios.find((x) => x.id === id);
  if (!s) throw new EngineInputError('scenario', `There is no scenario "${id}" in this model.`);
  return s;
}

/** Per-source power laws: a die source reads its part's law; a tiers source has fixed power. */
function sourceLaws(model: Model, laws: readonly NodePowerLaw[]): NodePowerLaw[] {
  return timelineSources(model).map((s) => (s.kind === 'junction' ? laws[s.node] : { dynamic: 0 }));
}

/** Simulate a scenario's profile, from ambient or the steady state of its start scenario. */
export function simulateJob(p: SimulateParams, hooks: LongRunHooks = {}): SimulationResult {
  const { model } = p;
  const scenario = scenarioOf(model, p.scenarioId);
  if (!scenario.profile || Object.keys(scenario.profile.parts).length === 0) {
    throw new EngineInputError('profile', `Scenario "${scenario.name}" has no time profile yet: add a level or a pulse train to a part.`);
  }
  const schedule = scheduleFromSegments(sourceSegments(model, scenario), toSourcePowers(model, scenarioNodePowers(model, scenario)));
  const from = scenario.profile.startFrom;
  let start: SimulationStart = 'ambient';
  if (from !== 'ambient') {
    const laws = nodePowerLaws(model, scenarioOf(model, from));
    const nodePower = p.feedback
      ? solveCoupled({ R: p.nodeSteady, baseTemperatures: p.baseTemperatures, laws }).powers.map((x) => x.total)
      : laws.map((l) => l.dynamic);
    start = { steadyPower: toSourcePowers(model, nodePower) };
  }
  const feedback = p.feedback ? sourceLaws(model, nodePowerLaws(model, scenario)) : undefined;
  return simulateProfile(p.network, schedule, { ...hooks, baseTemperatures: p.baseTemperatures, start, feedback, samplesPerInterval: p.samplesPerInterval });
}

/** Timing answers of one node. */
export function timingJob(p: TimingParams): TimingAnswers {
  return timingAnswers(p.network as FosterNetwork, p.baseTemperatures, p.request);
}

/** A one-entry memo of the steady network, keyed by the thermal part of the model. */
export interface NetworkMemo {
  key: string;
  net: AssemblyNetwork | null;
}

/** Electro-thermal analysis of a scenario on the model's steady network. */
export function couplingJob(model: Model, scenarioId: string, memo: NetworkMemo, cache: ImpedanceCache | null): CouplingResult {
  const key = networkKey(model);
  if (memo.key !== key || !memo.net) {
    memo.net = assemblyNetwork(model, { cache });
    memo.key = key;
  }
  return analyseCoupling(coupledProblem(model, scenarioOf(model, scenarioId), memo.net));
}
