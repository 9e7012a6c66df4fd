/** Colour scales of the compare screen: one shared temperature scale, and a diverging scale for differences. */
import { interpolateRdBu, scaleDiverging } from 'd3';
import { temperatureScale } from '@/components/results/colour';
import { gridRange, type Grid } from './mapImage';

/** Smallest half-width of the difference scale (K), so tiny differences are not painted as large. */
export const MIN_DIFFERENCE_SPAN = 1;

/** The shared temperature domain (°C) over all maps, or null before any result; rounded out to whole kelvin. */
export function sharedDomain(grids: Grid[]): [number, number] | null {
  const r = gridRange(grids);
  return r ? [Math.floor(r[0]), Math.ceil(r[1])] : null;
}

/** Temperature colour over a shared domain (inferno). */
export const sharedTemperatureScale = (domain: [number, number]) => temperatureScale(domain[0], domain[1]);

/** Symmetric half-width (K) covering the largest absolute difference, at least MIN_DIFFERENCE_SPAN. */
export function differenceSpan(grids: Grid[]): number {
  let m = 0;
  for (const g of grids) for (const v of g.values) if (Number.isFinite(v)) m = Math.max(m, Math.abs(v));
  return Math.max(MIN_DIFFERENCE_SPAN, Math.ceil(m));
}

/** Diverging colour for a difference (K): blue cooler, white 0, red hotter (d3 RdBu reversed), symmetric around 0. */
export function differenceScale(span: number) {
  return scaleDiverging((t: number) => interpolateRdBu(1 - t)).domain([-span, 0, span]).clamp(true);
}
