/** Colour domain of a temperature map: its range rounded out to whole kelvin (°C). */
import type { MapResult } from '@shared/engine';

/** [floor(min), ceil(max)] of the finite map values, or null for an empty map. */
export function mapDomain(map: Pick<MapResult, 'values'> | null | undefined): [number, number] | null {
  if (!map) return null;
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of map.values) if (Number.isFinite(v)) { if (v < lo) lo = v; if (v > hi) hi = v; }
  return lo <= hi ? [Math.floor(lo), Math.max(Math.ceil(hi), Math.floor(lo) + 1)] : null;
}
