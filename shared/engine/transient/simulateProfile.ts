/**
 * Temperature versus time of every node under a piecewise-constant power schedule, with the
 * Foster network (physics.md §3): exact for piecewise-constant power. With electro-thermal
 * feedback the power of each sub-step is evaluated at the temperatures at its start and held
 * over it (explicit, exponential-Euler; Hochbruck & Ostermann, Acta Numerica 19, 2010): first
 * order in the step, and it settles wherever the loop gain is below 1. Refine with
 * samplesPerInterval.
 */
import { evaluatePower, type NodePowerLaw } from '../electrothermal/powerLaw';
import { EngineInputError } from '../errors';
import { advanceState, decayFactors, packNetwork, stateTemperatures, steadyState } from './fosterState';
import type { FosterNetwork } from './fosterNetwork';
import { MAX_PROFILE_STEPS, type PowerSchedule } from './schedule';
import { checkCancelled, type LongRunHooks } from './progress';

/** Start of a simulation: ambient (no stored heat), steady at a power vector, or explicit states (W). */
export type SimulationStart = 'ambient' | { steadyPower: readonly number[] } | { state: Float64Array };

/** Options of simulateProfile. */
export interface SimulationOptions extends LongRunHooks {
  /** Temperature of each node with no power (fluids carried through), °C. */
  baseTemperatures: readonly number[];
  start?: SimulationStart;
  /** Samples per interval, log-spaced from 1/1000 of it to its end (default 1: interval ends only). */
  samplesPerInterval?: number;
  /** Power laws per source for leakage/Joule feedback; the schedule gives their dynamic power. */
  feedback?: readonly NodePowerLaw[];
  /** Cap on the number of samples. */
  maxSteps?: number;
  /** With feedback, stop as runaway when a node passes this (°C; default 1000). */
  temperatureCap?: number;
}

/** Result of simulateProfile: samples at `times` (s); temperatures[node][s] °C, power[source][s] W held from times[s]. */
export interface SimulationResult {
  status: 'complete' | 'runaway';
  times: number[];
  temperatures: number[][];
  power: number[][];
  /** Highest temperature of each node and when. */
  peaks: { temperature: number; time: number }[];
  /** Foster states at the last sample (W), to continue from. */
  finalState: Float64Array;
  message?: string;
}

function sampleOffsets(length: number, count: number): number[] {
  if (count <= 1) return [length];
  return Array.from({ length: count }, (_, q) => length * 10 ** ((-3 * (count - 1 - q)) / (count - 1)));
}

/** Simulate a schedule on a Foster network; bounded by maxSteps, cancellable. */
export function simulateProfile(network: FosterNetwork, schedule: PowerSchedule, options: SimulationOptions): SimulationResult {
  const net = packNetwork(network);
  const { n, rows } = net;
  const perInterval = Math.max(1, Math.floor(options.samplesPerInterval ?? 1));
  const intervals = schedule.power.length;
  const maxSteps = options.maxSteps ?? MAX_PROFILE_STEPS;
  if (intervals * perInterval > maxSteps) {
    throw new EngineInputError('profile', `The simulation needs ${intervals * perInterval} steps, above the cap of ${maxSteps}.`);
  }
  if (options.baseTemperatures.length !== rows) throw new EngineInputError('baseTemperatures', `Expected ${rows} base temperatures.`);
  if (schedule.power.some((row) => row.length !== n)) throw new EngineInputError('profile', `Every step needs ${n} source powers.`);
  const start = options.start ?? 'ambient';
  const x = start === 'ambient' ? steadyState(net, []) : 'state' in start ? Float64Array.from(start.state) : steadyState(net, start.steadyPower);
  const laws = options.feedback;
  const cap = options.temperatureCap ?? 1000;
  const times = [0];
  const T = stateTemperatures(net, x, options.baseTemperatures);
  const temperatures = Array.from(T, (t) => [t]);
  const power: number[][] = Array.from({ length: n }, () => []);
  const peaks = Array.from(T, (t) => ({ temperature: t, time: 0 }));
  const decay = new Float64Array(net.K);
  const p = new Float64Array(n);
  let lastDt = NaN;
  let status: SimulationResult['status'] = 'complete';
  for (let q = 0; q < intervals && status === 'complete'; q++) {
    if (q % 1000 === 0) checkCancelled(options, q / intervals);
    const t0 = schedule.bounds[q];
    let prev = 0;
    for (const off of sampleOffsets(schedule.bounds[q + 1] - t0, perInterval)) {
      for (let i = 0; i < n; i++) {
        const dyn = schedule.power[q][i];
        p[i] = laws ? evaluatePower({ ...laws[i], dynamic: dyn }, T[net.sourceNodes[i]]).total : dyn;
        power[i].push(p[i]);
      }
      const dt = off - prev;
      if (dt !== lastDt) decayFactors(net, dt, decay);
      lastDt = dt;
      advanceState(net, x, p, decay);
      stateTemperatures(net, x, options.baseTemperatures, T);
      prev = off;
      times.push(t0 + off);
      for (let j = 0; j < rows; j++) {
        temperatures[j].push(T[j]);
        if (T[j] > peaks[j].temperature) peaks[j] = { temperature: T[j], time: t0 + off };
      }
      if (laws && T.some((t) => !(t <= cap))) {
        status = 'runaway';
        break;
      }
    }
  }
  for (let i = 0; i < n; i++) power[i].push(p[i]);
  const message = status === 'runaway' ? `Thermal runaway: a temperature passed ${cap} °C at ${times[times.length - 1]} s; the simulation stopped.` : undefined;
  return { status, times, temperatures, power, peaks, finalState: x, message };
}
