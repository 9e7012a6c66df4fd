/**
 * Memo of modal tables and chosen truncations. Tables depend only on the footprint, the stack and s,
 * not on where the sources sit, so a drag re-uses them. Results never depend on the cache's content:
 * a cached table larger than asked for is used through its row stride (same W values).
 */
import { weightedImpedanceTable } from './impedance';
import type { ModalTable } from './influence';
import type { Channel, RectSource, Truncation } from './types';

/** A truncation found by the automatic search, with its convergence figures. */
export interface RememberedTruncation extends Truncation {
  converged: boolean;
  lastChange: number;
  roughSources?: number[];
}

interface Entry {
  key: string;
  table: ModalTable;
}

/** A small least-recently-used store of modal tables and chosen truncations. */
export class ImpedanceCache {
  private tables: Entry[] = [];
  private truncations = new Map<string, RememberedTruncation>();

  /** maxEntries: tables kept; maxValues: total table size kept (Float64 values; 8 bytes each). */
  constructor(
    readonly maxEntries = 12,
    readonly maxValues = 4_000_000,
  ) {}

  /** A table covering at least m × n modes for this channel and s (computed when missing). */
  table(channel: Channel, m: number, n: number, s = 0): ModalTable {
    const key = channelKey(channel, s);
    const idx = this.tables.findIndex((e) => e.key === key && e.table.m >= m && e.table.n >= n);
    if (idx >= 0) {
      const [entry] = this.tables.splice(idx, 1);
      this.tables.unshift(entry);
      return entry.table;
    }
    const table: ModalTable = { w: weightedImpedanceTable(channel, m, n, s), m, n };
    this.tables = this.tables.filter((e) => !(e.key === key && e.table.m <= m && e.table.n <= n));
    this.tables.unshift({ key, table });
    let total = 0;
    this.tables = this.tables.filter((e, i) => {
      total += e.table.w.length;
      return i === 0 || (i < this.maxEntries && total <= this.maxValues);
    });
    return table;
  }

  /** The truncation chosen earlier for this channel, settings tag (s, tolerance, cap) and set of source sizes. */
  truncation(channel: Channel, sources: readonly RectSource[], tag: string): RememberedTruncation | undefined {
    return this.truncations.get(truncationKey(channel, sources, tag));
  }

  /** Remember a chosen truncation (kept for at most 200 geometries). */
  rememberTruncation(channel: Channel, sources: readonly RectSource[], tag: string, t: RememberedTruncation): void {
    if (this.truncations.size >= 200) this.truncations.clear();
    this.truncations.set(truncationKey(channel, sources, tag), t);
  }

  /** Forget everything. */
  clear(): void {
    this.tables = [];
    this.truncations.clear();
  }
}

/** Identity of a channel's footprint, stack and s. */
export function channelKey(channel: Channel, s = 0): string {
  return JSON.stringify([channel.lx, channel.ly, channel.above, channel.below, s]);
}

function truncationKey(channel: Channel, sources: readonly RectSource[], tag: string): string {
  const sizes = sources.map((q) => `${q.width}x${q.height}`).sort();
  return `${channelKey(channel)}|${tag}|${sizes.join(',')}`;
}

/** The shared default cache (memoisation only; pass `cache: null` in options to bypass it). */
export const defaultImpedanceCache = new ImpedanceCache();
