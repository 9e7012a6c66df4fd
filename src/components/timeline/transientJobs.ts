/**
 * The transient worker's jobs as pure functions (no DOM): node-level impedance by Stehfest inversion
 * of the Laplace-domain assembly (physics.md §3) and its Foster fit, profile simulation, timing
 * answers, and the electro-thermal analysis of a scenario (physics.md §4).
 */
import type { Model } from '@shared/schemas/model';
import { assemblyNetwork, type AssemblyNetwork } from '@shared/engine/assembly/network';
import type { ImpedanceCache } from '@shared/engine/cache';
import { EngineInputError } from '@shared/engine/errors';
import { analyseCoupling, solveCoupled, type CouplingResult } from '@shared/engine/electrothermal';
import {
  checkCancelled, fitFosterNetwork, scheduleFromSegments, simulateProfile, stehfestAbscissae, stehfestCombine, timingAnswers,
  STEHFEST_TERMS, type LongRunHooks, type SimulationResult, type SimulationStart, type TimingAnswers,
} from '@shared/engine/transient';
import { assemblyResponseAt, prepareLaplaceAssembly } from '@shared/engine/transient/laplaceAssembly';
import { coupledProblem, nodePowerLaws } from '@/components/electrothermal/problem';
import { networkKey, nodeSegments, scenarioNodePowers, timelineNodes } from './nodes';
import type { ImpedanceResult, SimulateParams, TimingParams } from './protocol';

/** Step-response matrix Z[k][j][i] at `times`, its steady limit and Foster fit; progress per time. */
export function impedanceJob(model: Model, times: readonly number[], hooks: LongRunHooks = {}): ImpedanceResult {
  const a = prepareLaplaceAssembly(model);
  const n = a.nodeCount;
  const sources = Array.from({ length: n }, (_, i) => Float64Array.from({ length: n }, (_, k) => (k === i ? 1 : 0)));
  const Z = times.map((t, k) => {
    checkCancelled(hooks, k / times.length);
    const samples = stehfestAbscissae(t).map((s) => assemblyResponseAt(a, s, sources).map((v) => v / s));
    const q = new Float64Array(STEHFEST_TERMS);
    return Array.from({ length: n }, (_, j) =>
      Array.from({ length: n }, (_, i) => {
        samples.forEach((m, r) => (q[r] = m[j * n + i]));
        return stehfestCombine(t, q);
      }),
    );
  });
  checkCancelled(hooks, 1);
  const steady = Array.from({ length: n }, (_, j) => Array.from(a.steady.R.subarray(j * n, (j + 1) * n)));
  const labels = timelineNodes(model).map((x) => x.label);
  const { network, ...fit } = fitFosterNetwork({ times: [...times], Z, steady, labels });
  const method = `Stehfest inversion (N = ${STEHFEST_TERMS}) at ${times.length} times; Foster fit with ${network.tau.length} time constants`;
  return { times: [...times], Z, steady, baseTemperatures: Array.from(a.steady.offsets), fit, network, method };
}

function scenarioOf(model: Model, id: string) {
  const s = model.scenarios.find((x) => x.id === id);
  if (!s) throw new EngineInputError('scenario', `There is no scenario "${id}" in this model.`);
  return s;
}

/** Simulate a scenario's profile, from ambient or the steady state of its start scenario. */
export function simulateJob(p: SimulateParams, hooks: LongRunHooks = {}): SimulationResult {
  const scenario = scenarioOf(p.model, p.scenarioId);
  if (!scenario.profile) throw new EngineInputError('profile', `Scenario "${scenario.name}" has no time profile yet: add a segment first.`);
  const schedule = scheduleFromSegments(nodeSegments(p.model, scenario), scenarioNodePowers(p.model, scenario));
  const from = scenario.profile.startFrom;
  let start: SimulationStart = 'ambient';
  if (from !== 'ambient') {
    const base = scenarioOf(p.model, from);
    const laws = nodePowerLaws(p.model, base);
    if (!p.feedback) start = { steadyPower: laws.map((l) => l.dynamic) };
    else {
      const solved = solveCoupled({ R: steadyRows(p), baseTemperatures: p.baseTemperatures, laws });
      start = { steadyPower: solved.powers.map((x) => x.total) };
    }
  }
  const feedback = p.feedback ? nodePowerLaws(p.model, scenario) : undefined;
  return simulateProfile(p.network, schedule, { ...hooks, baseTemperatures: p.baseTemperatures, start, feedback, samplesPerInterval: p.samplesPerInterval });
}

/** Steady matrix of a Foster network: Σ_k R_k per entry. */
function steadyRows(p: SimulateParams): number[][] {
  return p.network.R.map((row) => row.map((terms) => terms.reduce((a, b) => a + b, 0)));
}

/** Timing answers of one node. */
export function timingJob(p: TimingParams): TimingAnswers {
  return timingAnswers(p.network, p.baseTemperatures, p.request);
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
