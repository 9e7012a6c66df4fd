/**
 * Multilayer rectangular flux channel with many uniform-flux rectangles (physics.md §1):
 * influence matrix, mean rises and the modal data the field functions re-use.
 */
import { defaultImpedanceCache, ImpedanceCache } from './cache';
import { checkChannel } from './checks';
import { EngineInputError } from './errors';
import { influenceFromSpectra, type ModalTable, type Spectra } from './influence';
import { CHANNEL_DEFAULTS } from './options';
import { autoTruncation, buildSpectra, checkTruncation, type TruncationReport } from './truncation';
import type { Channel, RectSource, Truncation } from './types';

/** Options of a channel solve; every field optional (defaults in CHANNEL_DEFAULTS). */
export interface ChannelOptions {
  /** Fixed truncation; chosen automatically when absent. */
  truncation?: Truncation;
  /** Real Laplace variable s ≥ 0 (1/s); 0 = steady state. */
  s?: number;
  /** Relative tolerance of the automatic truncation. */
  tolerance?: number;
  /** Cap on M·N. */
  maxModes?: number;
  /** Memo of modal tables; null bypasses memoisation. */
  cache?: ImpedanceCache | null;
  /**
   * Allow both faces adiabatic: the (0,0) mode is dropped, so rises are relative to the plane's unknown
   * mean level and the caller must add a zero-net-heat condition (the assembly does).
   */
  floating?: boolean;
}

/** Everything a field evaluation needs: the channel, its modal table, the sources' spectra. */
export interface ChannelModes {
  channel: Channel;
  sources: readonly RectSource[];
  table: ModalTable;
  spectra: Spectra;
  truncation: TruncationReport;
  s: number;
}

/** Influence matrix and the modal data behind it. matrix[j][i] = mean rise of j per W in i (K/W). */
export interface ChannelInfluence {
  matrix: number[][];
  /** The same matrix flat, row-major: flat[j·count + i]. */
  flat: Float64Array;
  truncation: TruncationReport;
  modes: ChannelModes;
}

/** Validate, pick the truncation and build the modal table and spectra. */
export function channelModes(channel: Channel, sources: readonly RectSource[], options: ChannelOptions = {}): ChannelModes {
  checkChannel(channel, sources, 'sources', options.floating ?? false);
  const s = options.s ?? CHANNEL_DEFAULTS.s;
  if (!(Number.isFinite(s) && s >= 0)) throw new EngineInputError('s', 'The Laplace variable s must be a finite number ≥ 0.');
  const maxModes = options.maxModes ?? CHANNEL_DEFAULTS.maxModes;
  const cache = options.cache === null ? new ImpedanceCache(4) : (options.cache ?? defaultImpedanceCache);
  let table: ModalTable;
  let truncation: TruncationReport;
  const tolerance = options.tolerance ?? CHANNEL_DEFAULTS.tolerance;
  const tag = `${s}|${tolerance}|${maxModes}`;
  const remembered = options.truncation ? undefined : cache.truncation(channel, sources, tag);
  if (options.truncation || remembered) {
    const t = options.truncation ?? remembered!;
    checkTruncation(t, maxModes);
    table = cache.table(channel, t.m, t.n, s);
    truncation = {
      m: t.m,
      n: t.n,
      auto: !options.truncation,
      converged: remembered?.converged ?? true,
      lastChange: remembered?.lastChange ?? 0,
      roughSources: remembered?.roughSources ?? [],
    };
  } else {
    const found = autoTruncation(channel, sources, cache, { tolerance, maxModes, s });
    table = found.table;
    truncation = found.report;
    cache.rememberTruncation(channel, sources, tag, truncation);
  }
  const pairs = (sources.length * (sources.length + 1)) / 2;
  if (truncation.m * truncation.n * pairs > CHANNEL_DEFAULTS.maxWork) {
    throw new EngineInputError('sources', `Too much work: ${sources.length} sources at ${truncation.m} × ${truncation.n} modes; use fewer sources or modes.`);
  }
  const spectra = buildSpectra(channel, sources, truncation.m, truncation.n);
  return { channel, sources, table, spectra, truncation, s };
}

/** Influence matrix of the sources on the channel (K/W), with the truncation used. */
export function channelInfluence(channel: Channel, sources: readonly RectSource[], options: ChannelOptions = {}): ChannelInfluence {
  const modes = channelModes(channel, sources, options);
  const flat = influenceFromSpectra(modes.table, modes.spectra);
  return { matrix: toRows(flat, sources.length), flat, truncation: modes.truncation, modes };
}

/** Mean rise of each rectangle (K) for the given powers (W): rise = R·P. */
export function meanRises(flat: Float64Array, powers: readonly number[]): number[] {
  const count = powers.length;
  const out = new Array<number>(count).fill(0);
  for (let j = 0; j < count; j++) {
    let sum = 0;
    for (let i = 0; i < count; i++) sum += flat[j * count + i] * powers[i];
    out[j] = sum;
  }
  return out;
}

/** Row-major flat square matrix → array of rows. */
export function toRows(flat: Float64Array, count: number): number[][] {
  const rows: number[][] = [];
  for (let j = 0; j < count; j++) rows.push(Array.from(flat.subarray(j * count, (j + 1) * count)));
  return rows;
}
