/**
 * Transient answers for a model document (physics.md §3): its impedance matrices and Foster network,
 * the power schedule of a scenario's profile (per-part segments on the part's junction source; a
 * memory stack's tiers heated evenly at their scenario total), the timeline with limits, optional
 * electro-thermal feedback, and the timing answers of one part.
 */
import type { Model, Scenario } from '../../schemas/model';
import { findScenario, loadOf } from '../assembly/loads';
import type { NodePowerLaw } from '../electrothermal/powerLaw';
import { EngineInputError } from '../errors';
import { assemblyImpedance, type AssemblyImpedance, type ImpedanceOptions } from './assemblyImpedance';
import { prepareLaplaceAssembly } from './laplaceAssembly';
import { fitFosterNetwork, type FosterNetworkFit, type FosterNetworkSettings } from './fosterNetwork';
import type { LongRunHooks } from './progress';
import { scheduleFromSegments, type PowerSchedule } from './schedule';
import { simulateProfile, type SimulationResult } from './simulateProfile';
import { timingAnswers, type TimingAnswers } from './timingAnswers';

/** Everything the transient answers of one model need. */
export interface ModelTransient {
  impedance: AssemblyImpedance;
  fit: FosterNetworkFit;
  /** Node temperatures with no power (°C): the fluid offsets of the steady network. */
  baseTemperatures: number[];
  /** Limit of each node (°C): its part's junction limit (memory tiers too). */
  limits: number[];
}

/** Compute the impedance matrices and their Foster network for a model (the long step: cancellable). */
export function prepareModelTransient(model: Model, options: Partial<ImpedanceOptions> & { fit?: Partial<FosterNetworkSettings> } = {}): ModelTransient {
  const laplace = options.laplace ?? prepareLaplaceAssembly(model);
  const impedance = assemblyImpedance(model, { ...options, laplace });
  const fit = fitFosterNetwork(impedance, options.fit);
  const limits = laplace.steady.nodes.map((node) => model.parts[node.partIndex].limits.junction);
  return { impedance, fit, baseTemperatures: Array.from(laplace.steady.offsets), limits };
}

/** Power of each source (W) in a scenario: a part's junction power, a stack's tier total. */
export function scenarioSourcePowers(mt: ModelTransient, model: Model, scenario: Scenario): number[] {
  return mt.impedance.sourceList.map((s) => {
    const load = loadOf(scenario, model.parts[s.part].id);
    return s.kind === 'tiers' ? (load.tiers ?? []).reduce((a, b) => a + b, 0) : load.power;
  });
}

/** The schedule of a scenario's profile; parts without segments hold their scenario power. */
export function scenarioSchedule(mt: ModelTransient, model: Model, scenarioId?: string): PowerSchedule {
  const { scenario } = findScenario(model, scenarioId);
  if (!scenario.profile) throw new EngineInputError('profile', `Scenario "${scenario.name}" has no power profile.`);
  const ids = new Set(model.parts.map((p) => p.id));
  for (const id of Object.keys(scenario.profile.parts)) {
    if (!ids.has(id)) throw new EngineInputError(`profile.parts.${id}`, `The profile names "${id}", which is not a part of this model.`);
  }
  const segments = mt.impedance.sourceList.map((s) => (s.kind === 'junction' ? scenario.profile!.parts[model.parts[s.part].id] : undefined));
  return scheduleFromSegments(segments, scenarioSourcePowers(mt, model, scenario));
}

/** Options of scenarioTimeline. */
export interface TimelineOptions extends LongRunHooks {
  /** Leakage and Joule feedback from the parts' electrical data (default false). */
  feedback?: boolean;
  samplesPerInterval?: number;
  rows?: number[];
}

/** A scenario's timeline from ambient or from the steady state of its `startFrom` scenario, with node limits. */
export function scenarioTimeline(mt: ModelTransient, model: Model, scenarioId?: string, options: TimelineOptions = {}): SimulationResult & { limits: number[]; startFrom: string } {
  const { scenario } = findScenario(model, scenarioId);
  const schedule = scenarioSchedule(mt, model, scenarioId);
  const startFrom = scenario.profile?.startFrom ?? 'ambient';
  const start = startFrom === 'ambient' ? 'ambient' : { steadyPower: scenarioSourcePowers(mt, model, findScenario(model, startFrom).scenario) };
  const feedback = options.feedback ? sourceLaws(mt, model, scenario) : undefined;
  const result = simulateProfile(mt.fit.network, schedule, { ...options, baseTemperatures: mt.baseTemperatures, start, feedback });
  const limits = options.rows ? options.rows.map((j) => mt.limits[j]) : mt.limits;
  return { ...result, limits, startFrom };
}

/** Power laws of the junction sources (leakage, copper path with the scenario current); others none. */
export function sourceLaws(mt: ModelTransient, model: Model, scenario: Scenario): NodePowerLaw[] {
  return mt.impedance.sourceList.map((s) => {
    const part = model.parts[s.part];
    const e = part.electrical;
    if (s.kind !== 'junction' || !e) return { dynamic: 0 };
    const { current } = loadOf(scenario, part.id);
    return { dynamic: 0, leakageAtRef: e.leakageAtRef, referenceTemperature: e.referenceTemperature, kappa: e.kappa, current, pathResistance20: e.pathResistance20, alpha: e.alpha };
  });
}

/**
 * What to ask about one part of a model. While boosting, the part runs at `boostPower` and every other
 * part at its power in `scenarioId`; while resting, the part runs at `restPower` and the others at their
 * powers in the start scenario (`startFrom`; all off for 'ambient'); the run starts from the steady
 * state of that resting state. The Timeline screen builds the same request (src/components/timeline/timingRequest.ts).
 */
export interface PartTimingRequest {
  partId: string;
  /** Scenario giving every other part's power while the part boosts (default: the model's first). */
  scenarioId?: string;
  boostPower: number;
  /** Default: the part's power in the start scenario (0 W from ambient). */
  restPower?: number;
  /** Default: the part's junction limit. */
  limit?: number;
  reenable?: number;
  /** 'ambient' or a scenario id: the resting powers and, at rest, the start state (default: `scenarioId` itself). */
  startFrom?: string;
  period?: number;
}

/** Timing answers of one part on a model (limits of every node checked for the duty cycle). */
export function modelTimingAnswers(mt: ModelTransient, model: Model, req: PartTimingRequest): TimingAnswers {
  const p = model.parts.findIndex((q) => q.id === req.partId);
  if (p < 0) throw new EngineInputError('partId', `There is no part "${req.partId}" in this model.`);
  const { scenario } = findScenario(model, req.scenarioId);
  const source = mt.impedance.sourceList.findIndex((s) => s.part === p && s.kind === 'junction');
  const from = req.startFrom ?? scenario.id;
  const startScenario = from === 'ambient' ? null : findScenario(model, from).scenario;
  const on = scenarioSourcePowers(mt, model, scenario);
  const rest = startScenario ? scenarioSourcePowers(mt, model, startScenario) : on.map(() => 0);
  if (req.restPower !== undefined) rest[source] = req.restPower;
  const boost = on.map((w, i) => (i === source ? req.boostPower : w));
  const start = startScenario ? { steadyPower: rest } : ('ambient' as const);
  const startLabel = startScenario ? `from ${startScenario.name.toLowerCase()}` : 'from ambient';
  return timingAnswers(mt.fit.network, mt.baseTemperatures, {
    node: mt.impedance.sourceNodes[source],
    limit: req.limit ?? model.parts[p].limits.junction,
    reenable: req.reenable,
    boostPower: boost,
    restPower: rest,
    start,
    startLabel,
    period: req.period,
    limits: mt.limits,
  });
}
