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
import { advanceState, decayFactors, packNetwork, stateTemperatures, steadyState, type PackedNetwork } from './fosterState';
import { selectRows, type FosterNetwork } from './fosterNetwork';
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
  /** Power laws per source for leakage/Joule feedback; the schedule gives their dynamic power (and a steady start is then the coupled one). */
  feedback?: readonly NodePowerLaw[];
  /** Cap on the number of samples. */
  maxSteps?: number;
  /** Only these nodes (row indices) are computed and returned, in this order (default all). */
  rows?: readonly number[];
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

/** Per-τ outputs u[j·K + k] = Σ_i R[j][i][k]·P_i of a power vector. */
function outputsOf(net: PackedNetwork, power: ArrayLike<number>, out: Float64Array): Float64Array {
  const { rows, n, K, r } = net;
  out.fill(0);
  for (let j = 0; j < rows; j++) {
    for (let i = 0; i < n; i++) {
      const p = power[i];
      if (p === 0) continue;
      const off = (j * n + i) * K;
      for (let k = 0; k < K; k++) out[j * K + k] += r[off + k] * p;
    }
  }
  return out;
}

/** Bound on the fixed-point sweeps of a coupled start state. */
const START_SWEEPS = 200;

/**
 * Steady start state at the given dynamic powers; with feedback the coupled steady state, by plain
 * fixed-point sweeps P ← P(T(P)) (they converge when the loop gain is below 1; bounded).
 */
function startState(net: PackedNetwork, dynamic: readonly number[], base: readonly number[], laws?: readonly NodePowerLaw[]): Float64Array {
  if (!laws) return steadyState(net, dynamic);
  let power = [...dynamic];
  for (let sweep = 0; sweep < START_SWEEPS; sweep++) {
    const T = stateTemperatures(net, steadyState(net, power), base);
    const next = dynamic.map((d, i) => (laws[i] && net.sourceNodes[i] >= 0 ? evaluatePower({ ...laws[i], dynamic: d }, T[net.sourceNodes[i]]).total : d));
    const change = Math.max(0, ...next.map((p, i) => Math.abs(p - power[i])));
    power = next;
    if (change <= 1e-9 * Math.max(1, ...power)) return steadyState(net, power);
  }
  throw new EngineInputError('start', 'The start scenario has no stable electro-thermal operating point (thermal runaway); start from ambient or lower its power.');
}

function sampleOffsets(length: number, count: number): number[] {
  if (count <= 1) return [length];
  return Array.from({ length: count }, (_, q) => length * 10 ** ((-3 * (count - 1 - q)) / (count - 1)));
}

/** Simulate a schedule on a Foster network; bounded by maxSteps, cancellable. */
export function simulateProfile(network: FosterNetwork, schedule: PowerSchedule, options: SimulationOptions): SimulationResult {
  if (options.rows) {
    const rows = options.rows;
    const bad = rows.findIndex((j) => !(Number.isInteger(j) && j >= 0 && j < network.R.length));
    if (bad >= 0) throw new EngineInputError(`rows[${bad}]`, `Choose nodes from 0 to ${network.R.length - 1}.`);
    const base = rows.map((j) => options.baseTemperatures[j]);
    return simulateProfile(selectRows(network, rows), schedule, { ...options, rows: undefined, baseTemperatures: base });
  }
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
  const laws = options.feedback;
  const x = start === 'ambient' ? steadyState(net, []) : 'state' in start ? Float64Array.from(start.state) : startState(net, start.steadyPower, options.baseTemperatures, laws);
  const cap = options.temperatureCap ?? 1000;
  const total = intervals * perInterval + 1;
  const times = new Float64Array(total);
  const T = stateTemperatures(net, x, options.baseTemperatures);
  const temps = Array.from(T, (t) => {
    const a = new Float64Array(total);
    a[0] = t;
    return a;
  });
  const powers = Array.from({ length: n }, () => new Float64Array(total));
  let sample = 0;
  const peaks = Array.from(T, (t) => ({ temperature: t, time: 0 }));
  const decay = new Float64Array(net.K);
  const p = new Float64Array(n);
  // y[j·K + k] = Σ_i R[j][i][k]·x[i][k] moves like each state: y ← u + (y − u)·e^{−Δt/τ_k}, u = outputs of P;
  // u is memoised per power vector (a pulse train has two), so a step costs O(rows·K), not O(rows·sources·K)
  const K = net.K;
  const y = new Float64Array(rows * K);
  for (let j = 0; j < rows; j++) for (let i = 0; i < n; i++) for (let k = 0; k < K; k++) y[j * K + k] += net.r[(j * n + i) * K + k] * x[i * K + k];
  const memo = new Map<number, { p: Float64Array; u: Float64Array }[]>();
  const weights = Float64Array.from({ length: n }, (_, i) => 1 + Math.sqrt(i + 2) * 0.618034);
  let u: Float64Array = new Float64Array(rows * K);
  let lastDt = NaN;
  let status: SimulationResult['status'] = 'complete';
  for (let q = 0; q < intervals && status === 'complete'; q++) {
    if (q % 1000 === 0) checkCancelled(options, q / intervals);
    const t0 = schedule.bounds[q];
    let prev = 0;
    for (const off of sampleOffsets(schedule.bounds[q + 1] - t0, perInterval)) {
      for (let i = 0; i < n; i++) {
        const dyn = schedule.power[q][i];
        p[i] = laws && laws[i] && net.sourceNodes[i] >= 0 ? evaluatePower({ ...laws[i], dynamic: dyn }, T[net.sourceNodes[i]]).total : dyn;
        powers[i][sample] = p[i];
      }
      const dt = off - prev;
      if (dt !== lastDt) decayFactors(net, dt, decay);
      lastDt = dt;
      advanceState(net, x, p, decay);
      if (laws) u = outputsOf(net, p, u);
      else {
        let key = 0;
        for (let i = 0; i < n; i++) key += weights[i] * p[i];
        const bucket = memo.get(key) ?? [];
        let hit: { p: Float64Array; u: Float64Array } | undefined;
        for (let b = 0; b < bucket.length && !hit; b++) {
          let same = true;
          for (let i = 0; i < n && same; i++) same = bucket[b].p[i] === p[i];
          if (same) hit = bucket[b];
        }
        if (!hit) {
          if (memo.size > 64) memo.clear();
          hit = { p: Float64Array.from(p), u: outputsOf(net, p, new Float64Array(rows * K)) };
          memo.set(key, [...bucket, hit]);
        }
        u = hit.u;
      }
      for (let j = 0; j < rows; j++) {
        let t = options.baseTemperatures[j];
        const o = j * K;
        for (let k = 0; k < K; k++) {
          const v = u[o + k] + (y[o + k] - u[o + k]) * decay[k];
          y[o + k] = v;
          t += v;
        }
        T[j] = t;
      }
      prev = off;
      sample++;
      times[sample] = t0 + off;
      for (let j = 0; j < rows; j++) {
        temps[j][sample] = T[j];
        if (T[j] > peaks[j].temperature) peaks[j] = { temperature: T[j], time: t0 + off };
      }
      if (laws && T.some((t) => !(t <= cap))) {
        status = 'runaway';
        break;
      }
    }
  }
  for (let i = 0; i < n; i++) powers[i][sample] = p[i];
  const used = sample + 1;
  const message = status === 'runaway' ? `Thermal runaway: a temperature passed ${cap} °C at ${times[sample]} s; the simulation stopped.` : undefined;
  const list = (a: Float64Array) => Array.from(a.subarray(0, used));
  return { status, times: list(times), temperatures: temps.map(list), power: powers.map(list), peaks, finalState: x, message };
}
