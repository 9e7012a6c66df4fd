/**
 * Periodic steady state of a Foster network under an on/off cycle (period, on-time, on and off
 * power per source). Per term the state at the start of the on-phase is the fixed point of one
 * cycle, x_s = [P_off(1 − B) + P_on·B(1 − A)] / (1 − A·B), A = e^{−t_on/τ}, B = e^{−t_off/τ}
 * (a geometric series of first-order responses). The largest on-time that keeps every node
 * within its limit is found by bisection (bounded).
 */
import { stateTemperatures, type PackedNetwork } from './fosterState';
import { stateAfter } from './crossing';

/** Samples per phase when looking for the cycle's maximum, and bisection bound. */
export const PERIODIC_SEARCH = { samplesPerPhase: 64, maxBisections: 60 } as const;

/** Foster states at the start of the on-phase in the periodic steady state. */
export function periodicStartState(net: PackedNetwork, period: number, onTime: number, onPower: readonly number[], offPower: readonly number[]): Float64Array {
  const x = new Float64Array(net.n * net.K);
  for (let k = 0; k < net.K; k++) {
    const A = Math.exp(-onTime / net.tau[k]);
    const B = Math.exp(-(period - onTime) / net.tau[k]);
    for (let i = 0; i < net.n; i++) x[i * net.K + k] = (offPower[i] * (1 - B) + onPower[i] * B * (1 - A)) / (1 - A * B);
  }
  return x;
}

/** Highest temperature of each node over one periodic cycle (°C), sampled on both phases and at the phase ends. */
export function cycleMaxima(net: PackedNetwork, base: readonly number[], period: number, onTime: number, onPower: readonly number[], offPower: readonly number[]): number[] {
  const xs = periodicStartState(net, period, onTime, onPower, offPower);
  const max = Array.from(stateTemperatures(net, xs, base));
  const scan = (x0: Float64Array, power: readonly number[], length: number) => {
    const S = PERIODIC_SEARCH.samplesPerPhase;
    for (let q = 1; q <= S; q++) {
      const t = q <= S / 2 ? length * 10 ** (-4 * (1 - q / (S / 2))) * 0.5 : (length * q) / S;
      const T = stateTemperatures(net, stateAfter(net, x0, power, t), base);
      for (let j = 0; j < net.rows; j++) max[j] = Math.max(max[j], T[j]);
    }
  };
  if (onTime > 0) scan(xs, onPower, onTime);
  if (period - onTime > 0) scan(stateAfter(net, xs, onPower, onTime), offPower, period - onTime);
  return max;
}

/** Largest on-time within `period` keeping node j below limits[j] (null = unchecked) in the periodic steady state. */
export function largestOnTime(
  net: PackedNetwork,
  base: readonly number[],
  period: number,
  onPower: readonly number[],
  offPower: readonly number[],
  limits: readonly (number | null)[],
): { onTime: number; limiting: number | null; continuous: boolean; impossible: boolean } {
  const excess = (onTime: number) => {
    const m = cycleMaxima(net, base, period, onTime, onPower, offPower);
    let worst = -Infinity;
    let node: number | null = null;
    m.forEach((t, j) => {
      const lim = limits[j];
      if (lim !== null && lim !== undefined && t - lim > worst) {
        worst = t - lim;
        node = j;
      }
    });
    return { worst, node };
  };
  const full = excess(period);
  if (full.worst <= 0) return { onTime: period, limiting: null, continuous: true, impossible: false };
  const none = excess(0);
  if (none.worst > 0) return { onTime: 0, limiting: none.node, continuous: false, impossible: true };
  let lo = 0;
  let hi = period;
  let limiting = full.node;
  for (let b = 0; b < PERIODIC_SEARCH.maxBisections && hi - lo > 1e-9 * period; b++) {
    const mid = 0.5 * (lo + hi);
    const e = excess(mid);
    if (e.worst <= 0) lo = mid;
    else {
      hi = mid;
      limiting = e.node;
    }
  }
  return { onTime: lo, limiting, continuous: false, impossible: false };
}
