/**
 * Timing answers for one part (physics.md §3): how long it may boost before a limit, how long it
 * must rest before it is re-enabled, and the longest on-time / highest duty cycle at a period
 * in the periodic steady state — as numbers and as plain sentences. Power is held fixed per
 * phase (no electro-thermal feedback here; use simulateProfile for that).
 */
import { EngineInputError } from '../errors';
import { firstCrossing, stateAfter } from './crossing';
import { packNetwork, steadyState } from './fosterState';
import type { FosterNetwork } from './fosterNetwork';
import { largestOnTime } from './periodic';
import { formatCelsius, formatDuration, formatPercent, formatWatts } from './sentences';
import type { SimulationStart } from './simulateProfile';

/** What to ask about one node. Powers are full vectors over all sources (W); temperatures °C. */
export interface TimingRequest {
  /** The chosen node (part or tier). */
  node: number;
  /** Limit of the chosen node (°C). */
  limit: number;
  /** Level at which it may boost again after resting (°C, below the limit). */
  reenable?: number;
  boostPower: readonly number[];
  restPower: readonly number[];
  start?: SimulationStart;
  /** Words for the start in sentences, e.g. "from idle" (default "from ambient"/"from the given state"). */
  startLabel?: string;
  /** Period of the on/off cycle (s) for the duty-cycle answer. */
  period?: number;
  /** Limit of every node for the duty-cycle answer (null = not checked); default only the chosen node. */
  limits?: readonly (number | null)[];
}

/** Numbers and sentences of the timing answers. Times in s. */
export interface TimingAnswers {
  boost: { time: number | null; startTemperature: number; finalTemperature: number; sentence: string };
  rest?: { time: number | null; finalTemperature: number; sentence: string };
  duty?: { period: number; onTime: number; dutyCycle: number; limitingNode: number | null; continuous: boolean; impossible: boolean; sentence: string };
}

/** Compute the timing answers of one node on a Foster network. */
export function timingAnswers(network: FosterNetwork, baseTemperatures: readonly number[], req: TimingRequest): TimingAnswers {
  const net = packNetwork(network);
  const n = net.n;
  if (!(Number.isInteger(req.node) && req.node >= 0 && req.node < net.rows)) throw new EngineInputError('node', `Choose a node from 0 to ${net.rows - 1}.`);
  for (const key of ['boostPower', 'restPower'] as const) {
    if (req[key].length !== n || !req[key].every((p) => Number.isFinite(p) && p >= 0)) throw new EngineInputError(key, `Give ${n} finite powers ≥ 0 W.`);
  }
  if (req.period !== undefined && !(Number.isFinite(req.period) && req.period > 0)) throw new EngineInputError('period', 'The period must be greater than 0 s.');
  const label = network.labels[req.node] ?? `node-${req.node}`;
  const start = req.start ?? 'ambient';
  const x0 = start === 'ambient' ? steadyState(net, []) : 'state' in start ? start.state : steadyState(net, start.steadyPower);
  const from = req.startLabel ?? (start === 'ambient' ? 'from ambient' : 'from the given state');
  const own = Array.from(net.sourceNodes).indexOf(req.node);
  const boostW = formatWatts(own >= 0 ? req.boostPower[own] : req.boostPower.reduce((a, b) => a + b, 0));
  const restW = formatWatts(own >= 0 ? req.restPower[own] : req.restPower.reduce((a, b) => a + b, 0));
  const lim = formatCelsius(req.limit);
  const up = firstCrossing(net, x0, req.boostPower, baseTemperatures, req.node, req.limit, 'up');
  const boostSentence =
    up.time === null
      ? `${label} stays below ${lim} at ${boostW} ${from}: it settles at ${formatCelsius(up.finalTemperature)} in steady state.`
      : up.time === 0
        ? `${label} is already at or above ${lim} ${from} (${formatCelsius(up.startTemperature)}).`
        : `${label} reaches ${lim} after ${formatDuration(up.time)} at ${boostW} ${from}.`;
  const answers: TimingAnswers = { boost: { ...up, sentence: boostSentence } };
  if (req.reenable !== undefined && up.time !== null) {
    const atLimit = stateAfter(net, x0, req.boostPower, up.time);
    const down = firstCrossing(net, atLimit, req.restPower, baseTemperatures, req.node, req.reenable, 'down');
    const sentence =
      down.time === null
        ? `${label} never cools to ${formatCelsius(req.reenable)} at ${restW}: it settles at ${formatCelsius(down.finalTemperature)}.`
        : `${label} cools from ${lim} to ${formatCelsius(req.reenable)} in ${formatDuration(down.time)} at ${restW}.`;
    answers.rest = { time: down.time, finalTemperature: down.finalTemperature, sentence };
  }
  if (req.period !== undefined) {
    const limits = req.limits ?? network.labels.map((_, j) => (j === req.node ? req.limit : null));
    const d = largestOnTime(net, baseTemperatures, req.period, req.boostPower, req.restPower, limits);
    const P = formatDuration(req.period);
    const who = d.limiting === null ? '' : `; ${network.labels[d.limiting] ?? `node-${d.limiting}`} sets the limit`;
    const sentence = d.continuous
      ? `At a ${P} period ${label} can run at ${boostW} continuously: every part stays within its limit.`
      : d.impossible
        ? `At a ${P} period no on-time works: even at ${restW} the limit is exceeded${who}.`
        : `At a ${P} period ${label} may run at ${boostW} for at most ${formatDuration(d.onTime)} per cycle (duty cycle ${formatPercent(d.onTime / req.period)}, ${restW} off)${who}.`;
    answers.duty = { period: req.period, onTime: d.onTime, dutyCycle: d.onTime / req.period, limitingNode: d.limiting, continuous: d.continuous, impossible: d.impossible, sentence };
  }
  return answers;
}
