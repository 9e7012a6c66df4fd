/**
 * Automatic choice of the modal truncation (physics.md §1): start near 20·L / (smallest source side)
 * per axis and double until the self-resistances — the largest entries of the influence matrix —
 * change by less than the tolerance relative to the largest; the level whose doubling changed that little
 * is the one used. The error falls roughly as 1/M²; the
 * values compared are the Richardson-finished sums of influence.ts (each level uses its half level).
 */
import { ImpedanceCache } from './cache';
import { EngineInputError } from './errors';
import { selfInfluenceFromSpectra, type ModalTable, type Spectra } from './influence';
import { CHANNEL_DEFAULTS } from './options';
import { axisSpectra } from './spectrum';
import type { Channel, RectSource, Truncation } from './types';

/** The truncation used, how it was chosen and whether the doubling converged. */
export interface TruncationReport extends Truncation {
  auto: boolean;
  converged: boolean;
  /** Relative change of the largest self-resistance at the last doubling (or the Richardson correction when the cap allowed one level); 0 when fixed. */
  lastChange: number;
  /**
   * Sources left out of the search because their area is below SMALL_SOURCE_FRACTION of the largest
   * (tiny passives would otherwise multiply the modes needed); their own figures are rough.
   */
  roughSources?: number[];
}

/** Sources smaller than this fraction of the largest source's area do not steer the truncation. */
export const SMALL_SOURCE_FRACTION = 0.01;

/** Indices of the sources that steer the truncation, and of those too small to. */
export function splitBySize(sources: readonly RectSource[]): { steering: number[]; rough: number[] } {
  const areas = sources.map((q) => q.width * q.height);
  const largest = Math.max(...areas);
  const steering: number[] = [];
  const rough: number[] = [];
  areas.forEach((a, i) => (a >= SMALL_SOURCE_FRACTION * largest ? steering : rough).push(i));
  return { steering, rough };
}

/** Settings of the truncation search. */
export interface TruncationSettings {
  tolerance: number;
  maxModes: number;
  s: number;
}

/** Spectra of all sources at a given truncation. */
export function buildSpectra(channel: Channel, sources: readonly RectSource[], m: number, n: number): Spectra {
  return { fx: axisSpectra(sources, channel.lx, m, 'x'), fy: axisSpectra(sources, channel.ly, n, 'y'), m, n, count: sources.length };
}

/** Refuse an explicit truncation outside [1, cap]. */
export function checkTruncation(t: Truncation, maxModes: number): void {
  if (!(Number.isInteger(t.m) && Number.isInteger(t.n) && t.m >= 1 && t.n >= 1)) {
    throw new EngineInputError('truncation', 'The truncation must be whole numbers of modes m ≥ 1 and n ≥ 1.');
  }
  if (t.m * t.n > maxModes) {
    throw new EngineInputError('truncation', `The truncation ${t.m} × ${t.n} = ${t.m * t.n} modes is above the cap of ${maxModes} (M·N); use fewer modes.`);
  }
}

function startCount(length: number, smallest: number): number {
  return Math.max(Math.ceil((CHANNEL_DEFAULTS.startFactor * length) / smallest), CHANNEL_DEFAULTS.minModes);
}

function largestChange(next: Float64Array, prev: Float64Array): number {
  let largest = 0;
  let change = 0;
  for (let i = 0; i < next.length; i++) {
    largest = Math.max(largest, Math.abs(next[i]));
    change = Math.max(change, Math.abs(next[i] - prev[i]));
  }
  return largest > 0 ? change / largest : 0;
}

/** Double the truncation until the self-resistances settle; returns the level used and a table covering it. */
export function autoTruncation(
  channel: Channel,
  sources: readonly RectSource[],
  cache: ImpedanceCache,
  settings: TruncationSettings,
): { report: TruncationReport; table: ModalTable } {
  const { steering, rough } = splitBySize(sources);
  const steer = steering.map((i) => sources[i]);
  let m = startCount(channel.lx, Math.min(...steer.map((q) => q.width)));
  let n = startCount(channel.ly, Math.min(...steer.map((q) => q.height)));
  if (m * n > settings.maxModes) {
    const shrink = Math.sqrt(settings.maxModes / (m * n));
    m = Math.max(1, Math.floor(m * shrink));
    n = Math.max(1, Math.floor(n * shrink));
  }
  let table = cache.table(channel, m, n, settings.s);
  let prev = selfInfluenceFromSpectra(table, buildSpectra(channel, steer, m, n));
  let lastChange = Infinity;
  for (let k = 0; k < CHANNEL_DEFAULTS.maxDoublings && 4 * m * n <= settings.maxModes; k++) {
    const finer = cache.table(channel, 2 * m, 2 * n, settings.s);
    const next = selfInfluenceFromSpectra(finer, buildSpectra(channel, steer, 2 * m, 2 * n));
    lastChange = largestChange(next, prev);
    // Converged: doubling changes nothing that matters, so the current level is kept (the finer table stays cached).
    if (lastChange < settings.tolerance) break;
    m *= 2;
    n *= 2;
    table = finer;
    prev = next;
  }
  if (lastChange === Infinity) {
    // The cap allowed one level only: the size of its Richardson correction bounds its error.
    lastChange = largestChange(prev, selfInfluenceFromSpectra(table, buildSpectra(channel, steer, m, n), 'raw'));
  }
  const converged = lastChange < settings.tolerance;
  return { report: { m, n, auto: true, converged, lastChange, roughSources: rough }, table };
}
