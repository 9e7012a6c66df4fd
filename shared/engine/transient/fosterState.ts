/**
 * State of a Foster network: one exponential state x[i][k] (W) per source i and time constant
 * τ_k, the power seen through the first-order lag τ_k. Node temperatures are
 * T_j = T_base,j + Σ_i Σ_k R[j][i][k]·x[i][k]; under constant power P over Δt each state moves
 * exactly as x ← P + (x − P)·e^{−Δt/τ_k} (first-order response, Incropera & DeWitt ch. 5).
 */
import type { FosterNetwork } from './fosterNetwork';

/** Flat, fast form of a network: r[(j·n + i)·K + k], with `rows` nodes, n sources and K time constants. */
export interface PackedNetwork {
  rows: number;
  n: number;
  K: number;
  tau: Float64Array;
  r: Float64Array;
  /** Row each source's power law reads (feedback). */
  sourceNodes: Int32Array;
}

/** Pack a network for the inner loops. */
export function packNetwork(network: FosterNetwork): PackedNetwork {
  const rows = network.R.length;
  const n = rows > 0 ? network.R[0].length : 0;
  const K = network.tau.length;
  const r = new Float64Array(rows * n * K);
  for (let j = 0; j < rows; j++) for (let i = 0; i < n; i++) for (let k = 0; k < K; k++) r[(j * n + i) * K + k] = network.R[j][i][k];
  const sourceNodes = Int32Array.from({ length: n }, (_, i) => network.sourceNodes?.[i] ?? i);
  return { rows, n, K, tau: Float64Array.from(network.tau), r, sourceNodes };
}

/** State with every source in steady state at `power` (W); zeros = ambient. */
export function steadyState(net: PackedNetwork, power: readonly number[]): Float64Array {
  const x = new Float64Array(net.n * net.K);
  for (let i = 0; i < net.n; i++) x.fill(power[i] ?? 0, i * net.K, (i + 1) * net.K);
  return x;
}

/** Advance the state in place by dt at constant power (decay[k] = e^{−dt/τ_k} precomputed). */
export function advanceState(net: PackedNetwork, x: Float64Array, power: ArrayLike<number>, decay: Float64Array): void {
  const K = net.K;
  for (let i = 0; i < net.n; i++) {
    const p = power[i];
    const base = i * K;
    for (let k = 0; k < K; k++) x[base + k] = p + (x[base + k] - p) * decay[k];
  }
}

/** Decay factors e^{−dt/τ_k} into `out`. */
export function decayFactors(net: PackedNetwork, dt: number, out = new Float64Array(net.K)): Float64Array {
  for (let k = 0; k < net.K; k++) out[k] = Math.exp(-dt / net.tau[k]);
  return out;
}

/** Node temperatures (°C) of a state into `out`. */
export function stateTemperatures(net: PackedNetwork, x: Float64Array, base: readonly number[], out: Float64Array = new Float64Array(net.rows)): Float64Array {
  const { n, K, r } = net;
  const row = n * K;
  for (let j = 0; j < net.rows; j++) {
    let s = base[j];
    const off = j * row;
    for (let q = 0; q < row; q++) s += r[off + q] * x[q];
    out[j] = s;
  }
  return out;
}

/** Temperature of node j at time t after a state x0 when power P is held constant (closed form). */
export function temperatureAfter(net: PackedNetwork, x0: Float64Array, power: readonly number[], base: readonly number[], j: number, t: number): number {
  const { n, K, r, tau } = net;
  let s = base[j];
  for (let k = 0; k < K; k++) {
    const d = Math.exp(-t / tau[k]);
    for (let i = 0; i < n; i++) {
      const p = power[i];
      s += r[(j * n + i) * K + k] * (p + (x0[i * K + k] - p) * d);
    }
  }
  return s;
}
