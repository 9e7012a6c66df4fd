/**
 * Thermal impedance of a flux channel (physics.md §3): Z_ji(t) of every source rectangle for a
 * unit power step in every source, by Stehfest inversion of the projected Laplace-domain influence
 * matrix. Also the transient part of the channel request: `times` plus per-layer rho and cp give
 * `impedance[k][j][i]`.
 */
import { channelRequestSchema } from '../../schemas/channel';
import { channelModes, type ChannelOptions } from '../channel';
import { toChannel } from '../channelRequest';
import { EngineInputError } from '../errors';
import type { Channel, ChannelStack, RectSource } from '../types';
import { parseOrThrow } from '../zodIssues';
import { validateTimes } from './assemblyImpedance';
import { buildPlaneKernel, planeMatrixAt } from './planeKernel';
import { checkCancelled, type LongRunHooks } from './progress';
import { stehfestAbscissae, stehfestCombine, STEHFEST_TERMS } from './stehfest';

/** Impedance matrices of a channel: impedance[k][j][i] (K/W) at times[k], with the steady matrix and truncation. */
export interface ChannelImpedance {
  times: number[];
  impedance: number[][][];
  steady: number[][];
  truncation: { m: number; n: number };
  /** Distinct Laplace evaluations used. */
  evaluations: number;
}

/** Throw EngineInputError naming the first layer without density or specific heat. */
export function requireHeatCapacity(channel: Channel): void {
  const check = (stack: ChannelStack, side: 'above' | 'below') =>
    stack.layers.forEach((l, i) => {
      for (const key of ['rho', 'cp'] as const) {
        if (!(l[key] !== undefined && l[key]! > 0)) {
          throw new EngineInputError(`${side}.layers[${i}].${key}`, `A transient needs the density (rho, kg/m³) and specific heat (cp, J/kg·K) of every layer; ${side} layer ${i + 1} has no ${key}.`);
        }
      }
    });
  check(channel.above, 'above');
  check(channel.below, 'below');
}

/** Step responses of the sources of a channel at the given times (s). */
export function channelImpedance(
  channel: Channel,
  sources: readonly RectSource[],
  times: readonly number[],
  options: Pick<ChannelOptions, 'truncation' | 'cache'> & LongRunHooks = {},
): ChannelImpedance {
  validateTimes(times);
  requireHeatCapacity(channel);
  const modes = channelModes(channel, sources, { truncation: options.truncation, cache: options.cache });
  const kernel = buildPlaneKernel(modes);
  const n = sources.length;
  const memo = new Map<string, Float64Array>();
  const at = (s: number) => {
    const key = s.toPrecision(13);
    let v = memo.get(key);
    if (!v) {
      if (memo.size % 16 === 0) checkCancelled(options, memo.size / (times.length * STEHFEST_TERMS));
      v = planeMatrixAt(kernel, s);
      memo.set(key, v);
    }
    return v;
  };
  const f = new Float64Array(STEHFEST_TERMS);
  const impedance = times.map((t) => {
    const abscissae = stehfestAbscissae(t);
    const samples = abscissae.map(at);
    return Array.from({ length: n }, (_, j) =>
      Array.from({ length: n }, (_, i) => {
        for (let q = 0; q < STEHFEST_TERMS; q++) f[q] = samples[q][j * n + i] / abscissae[q];
        return stehfestCombine(t, f);
      }),
    );
  });
  const R0 = planeMatrixAt(kernel, 0);
  const steady = Array.from({ length: n }, (_, j) => Array.from(R0.subarray(j * n, (j + 1) * n)));
  return { times: [...times], impedance, steady, truncation: { m: modes.truncation.m, n: modes.truncation.n }, evaluations: memo.size };
}

/** The transient part of a channel request (unknown JSON body with `times`): its impedance matrices. */
export function solveChannelTransient(body: unknown, hooks: LongRunHooks = {}): ChannelImpedance {
  const req = parseOrThrow(channelRequestSchema, body);
  if (!req.times) throw new EngineInputError('times', 'A transient needs output times (s), positive and increasing.');
  const sources = req.sources.map((q) => ({ x: q.x, y: q.y, width: q.width, height: q.height }));
  return channelImpedance(toChannel(req), sources, req.times, { truncation: req.truncation, ...hooks });
}
