/**
 * When does a node's temperature first cross a level under constant power from a given state?
 * T_j(t) has the closed form of fosterState.ts; the first crossing is bracketed on a log-spaced
 * time grid spanning the network's time constants and refined by bisection (both bounded).
 */
import { temperatureAfter, type PackedNetwork } from './fosterState';

/** Grid density of the crossing search (points per decade) and bisection bound. */
export const CROSSING_SEARCH = { perDecade: 40, maxBisections: 100 } as const;

/** Result of a crossing search. */
export interface Crossing {
  /** Time of the first crossing (s), 0 if already across, null if never. */
  time: number | null;
  /** Temperature at the start (°C). */
  startTemperature: number;
  /** Temperature the node settles at under this power (°C). */
  finalTemperature: number;
}

/** First t ≥ 0 with T_j(t) ≥ level ('up') or ≤ level ('down'). */
export function firstCrossing(
  net: PackedNetwork,
  x0: Float64Array,
  power: readonly number[],
  base: readonly number[],
  j: number,
  level: number,
  direction: 'up' | 'down',
): Crossing {
  const T = (t: number) => temperatureAfter(net, x0, power, base, j, t);
  const across = (v: number) => (direction === 'up' ? v >= level : v <= level);
  const startTemperature = T(0);
  const finalTemperature = T(Infinity);
  if (across(startTemperature)) return { time: 0, startTemperature, finalTemperature };
  const tauMin = Math.min(...net.tau);
  const tauMax = Math.max(...net.tau);
  const t0 = tauMin / 1000;
  const t1 = tauMax * 50;
  const count = Math.ceil(Math.log10(t1 / t0) * CROSSING_SEARCH.perDecade) + 1;
  let lo = 0;
  let hi = NaN;
  for (let q = 0; q < count; q++) {
    const t = t0 * (t1 / t0) ** (q / (count - 1));
    if (across(T(t))) {
      hi = t;
      break;
    }
    lo = t;
  }
  if (Number.isNaN(hi)) return { time: null, startTemperature, finalTemperature };
  for (let b = 0; b < CROSSING_SEARCH.maxBisections && hi - lo > 1e-12 * hi; b++) {
    const mid = 0.5 * (lo + hi);
    if (across(T(mid))) hi = mid;
    else lo = mid;
  }
  return { time: hi, startTemperature, finalTemperature };
}

/** The state after holding `power` for time t from x0 (exact). */
export function stateAfter(net: PackedNetwork, x0: Float64Array, power: readonly number[], t: number): Float64Array {
  const x = new Float64Array(x0.length);
  for (let k = 0; k < net.K; k++) {
    const d = Math.exp(-t / net.tau[k]);
    for (let i = 0; i < net.n; i++) x[i * net.K + k] = power[i] + (x0[i * net.K + k] - power[i]) * d;
  }
  return x;
}
