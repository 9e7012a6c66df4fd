/**
 * Thermal impedance of an assembly (physics.md §3): Z_ji(t), the rise of every node (part junction
 * and memory tier) per watt stepped on in every source, by Stehfest inversion of Z(s)/s, from
 * 1 µs to when the slowest response settles, with the checks that make it trustworthy.
 */
import type { Model } from '../../schemas/model';
import { EngineInputError } from '../errors';
import { assemblyResponseAt, prepareLaplaceAssembly, type LaplaceAssembly } from './laplaceAssembly';
import type { ImpedanceSeries } from './fosterNetwork';
import { checkCancelled, type LongRunHooks } from './progress';
import { assemblySources, type ImpedanceSource } from './impedanceSources';
import { impedanceChecks, type ImpedanceChecks } from './impedanceChecks';
import { stehfestAbscissae, stehfestCombine, STEHFEST_TERMS } from './stehfest';

/** Options of assemblyImpedance (defaults in IMPEDANCE_DEFAULTS). */
export interface ImpedanceOptions extends LongRunHooks {
  /** Explicit output times (s, increasing); otherwise `count` times from tStart to the settling time. */
  times?: number[];
  count: number;
  tStart: number;
  /** End time (s); found from the settling of the slowest response when absent. */
  tEnd?: number;
  /** A response has settled when |Z(t) − R| ≤ this · √(largest R of its row · largest R of its column) for every entry. */
  settleTolerance: number;
  /** 'parts': one source per part junction plus one per memory stack's tiers; 'nodes': every node. */
  sources: 'parts' | 'nodes';
  stehfestTerms: number;
  /** A prepared Laplace network to reuse (it holds the plane kernels). */
  laplace?: LaplaceAssembly;
}

/** Default impedance options. */
export const IMPEDANCE_DEFAULTS: ImpedanceOptions = { count: 60, tStart: 1e-6, settleTolerance: 1e-3, sources: 'parts', stehfestTerms: STEHFEST_TERMS };

/** Most output times accepted. */
export const MAX_IMPEDANCE_TIMES = 1000;

/** Impedance matrices of an assembly with their sources, settling time and checks. */
export interface AssemblyImpedance extends ImpedanceSeries {
  labels: string[];
  sourceLabels: string[];
  sourceNodes: number[];
  sourceList: ImpedanceSource[];
  /** Time (s) after which every response is within settleTolerance of steady. */
  settleTime: number;
  /** Distinct Laplace evaluations used. */
  evaluations: number;
  checks: ImpedanceChecks;
}

/** Evaluator of Z(s) (flat rows × sources) with a memo on s, counting evaluations. */
function memoEvaluator(lap: LaplaceAssembly, weights: Float64Array[], hooks: LongRunHooks, expected: number) {
  const memo = new Map<string, Float64Array>();
  const at = (s: number): Float64Array => {
    const key = s.toPrecision(13);
    let v = memo.get(key);
    if (!v) {
      if (memo.size % 16 === 0) checkCancelled(hooks, Math.min(1, memo.size / expected));
      v = assemblyResponseAt(lap, s, weights);
      memo.set(key, v);
    }
    return v;
  };
  return { at, count: () => memo.size };
}

function invertAt(at: (s: number) => Float64Array, t: number, size: number, N: number): Float64Array {
  const samples = stehfestAbscissae(t, N).map((s) => ({ s, z: at(s) }));
  const out = new Float64Array(size);
  const f = new Float64Array(N);
  for (let e = 0; e < size; e++) {
    for (let q = 0; q < N; q++) f[q] = samples[q].z[e] / samples[q].s;
    out[e] = stehfestCombine(t, f, N);
  }
  return out;
}

/** Log-spaced times t_k = tStart·2^{k/p} (an integer p, so Stehfest abscissae repeat and are reused) reaching tEnd. */
export function impedanceTimes(tStart: number, tEnd: number, count: number): number[] {
  const octaves = Math.log2(Math.max(tEnd / tStart, 2));
  const p = Math.max(1, Math.floor((count - 1) / octaves));
  return Array.from({ length: count }, (_, k) => tStart * 2 ** (k / p));
}

/** Thermal impedance matrices of a model's assembly. */
export function assemblyImpedance(model: Model, options: Partial<ImpedanceOptions> = {}): AssemblyImpedance {
  const o = { ...IMPEDANCE_DEFAULTS, ...options };
  if (o.times) validateTimes(o.times);
  const lap = o.laplace ?? prepareLaplaceAssembly(model);
  const sources = assemblySources(lap, o.sources);
  const weights = sources.map((s) => s.weights);
  const rows = lap.nodeCount;
  const S = sources.length;
  const size = rows * S;
  const expected = (o.times?.length ?? o.count) * o.stehfestTerms * 0.6 + 200;
  const ev = memoEvaluator(lap, weights, o, expected);
  const R0 = assemblyResponseAt(lap, 0, weights);
  const rowMax = new Float64Array(rows);
  const colMax = new Float64Array(S);
  for (let e = 0; e < size; e++) {
    rowMax[Math.floor(e / S)] = Math.max(rowMax[Math.floor(e / S)], Math.abs(R0[e]));
    colMax[e % S] = Math.max(colMax[e % S], Math.abs(R0[e]));
  }
  const scale = (j: number, i: number) => Math.sqrt(rowMax[j] * colMax[i]);
  let settleTime = NaN;
  for (let t = 1e-3, d = 0; d < 50; d++, t *= 2) {
    const z = invertAt(ev.at, t, size, o.stehfestTerms);
    let ok = true;
    for (let e = 0; e < size && ok; e++) ok = Math.abs(z[e] - R0[e]) <= o.settleTolerance * scale(Math.floor(e / S), e % S);
    if (ok) {
      settleTime = t;
      break;
    }
  }
  if (Number.isNaN(settleTime)) throw new EngineInputError('model', 'The responses did not settle within 1e12 s; check the cooling (h) of the stack.');
  const times = o.times ?? impedanceTimes(o.tStart, o.tEnd ?? settleTime, o.count);
  const flat = times.map((t) => invertAt(ev.at, t, size, o.stehfestTerms));
  checkCancelled(o, 1);
  const toRows = (v: Float64Array) => Array.from({ length: rows }, (_, j) => Array.from(v.subarray(j * S, (j + 1) * S)));
  const labels = lap.steady.nodes.map((n) => nodeLabel(model, n.partIndex, n.tier));
  return {
    times,
    Z: flat.map(toRows),
    steady: toRows(R0),
    labels,
    sourceLabels: sources.map((s) => s.label),
    sourceNodes: sources.map((s) => s.node),
    sourceList: sources,
    settleTime,
    evaluations: ev.count(),
    checks: impedanceChecks(lap, sources, times, flat, R0),
  };
}

/** Row name of a node: the part id, or "id/tier-k" for DRAM tier k. */
export function nodeLabel(model: Model, part: number, tier: number): string {
  const id = model.parts[part]?.id ?? `part-${part}`;
  return tier === 0 ? id : `${id}/tier-${tier}`;
}

/** Throw EngineInputError unless times are finite, positive, increasing and not too many. */
export function validateTimes(times: readonly number[], path = 'times'): void {
  if (times.length === 0) throw new EngineInputError(path, 'Give at least one time.');
  if (times.length > MAX_IMPEDANCE_TIMES) throw new EngineInputError(path, `At most ${MAX_IMPEDANCE_TIMES} times, got ${times.length}.`);
  times.forEach((t, k) => {
    if (!(Number.isFinite(t) && t > 0)) throw new EngineInputError(`${path}[${k}]`, 'Times must be finite numbers greater than 0 s.');
    if (k > 0 && !(t > times[k - 1])) throw new EngineInputError(`${path}[${k}]`, `Times must increase: ${t} s follows ${times[k - 1]} s.`);
  });
}
