/** "Who heats me": a part's rise above the fluid split into its own heat and each neighbour's (R_ij·P_j). */
import type { AssemblyResult } from '@shared/engine';

/** One bar of the waterfall: from `start` to `start + kelvin` (K). */
export interface HeatBar {
  id: string;
  name: string;
  kelvin: number;
  start: number;
  self: boolean;
}

/** Contributions below this (K) are summed into one "others" bar. */
export const SMALL_SHARE = 0.05;

/** Bars for part `partId`: self first, neighbours by size, small ones pooled, unpowered ones left out; they sum to the rise. */
export function whoHeats(result: AssemblyResult, partId: string): { bars: HeatBar[]; rise: number; fluid: number; junction: number } | null {
  const i = result.influence.partIds.indexOf(partId);
  const part = result.parts[i];
  if (i < 0 || !part) return null;
  const row = result.contributions[i];
  const others = row
    .map((k, j) => ({ id: result.parts[j].id, name: result.parts[j].name, kelvin: k }))
    .filter((_, j) => j !== i)
    .sort((a, b) => b.kelvin - a.kelvin);
  const big = others.filter((o) => Math.abs(o.kelvin) >= SMALL_SHARE);
  const small = others.filter((o) => Math.abs(o.kelvin) < SMALL_SHARE && o.kelvin !== 0);
  const list = [{ id: part.id, name: 'Own heat', kelvin: row[i] }, ...big];
  if (small.length) list.push({ id: '_others', name: `${small.length} other part${small.length > 1 ? 's' : ''}`, kelvin: small.reduce((s, o) => s + o.kelvin, 0) });
  let start = 0;
  const bars = list.map((b, k) => {
    const bar = { ...b, start, self: k === 0 };
    start += b.kelvin;
    return bar;
  });
  return { bars, rise: start, fluid: part.fluidOffset, junction: part.junction };
}
