/**
 * Data colours of the result views, all from d3's perceptual maps (no rainbow): inferno for
 * temperatures, a red–yellow–blue diverging map for margins (a difference to a limit), and a
 * sequential map for matrix cells whose lightness runs away from the page background in each theme.
 */
import { color, interpolateInferno, interpolateRdYlBu, interpolateYlOrRd, scaleDiverging, scaleSequential } from 'd3';

/** Temperature colour (°C → css colour) over [min, max], inferno. */
export function temperatureScale(min: number, max: number) {
  const hi = max > min ? max : min + 1;
  return scaleSequential(interpolateInferno).domain([min, hi]).clamp(true);
}

/** Margin to limit (K) at which the margin colour saturates: over by 10 K / clear by 20 K. */
export const MARGIN_DOMAIN: [number, number, number] = [-10, 0, 20];

/** Margin colour (K → css colour): red over the limit, pale yellow at it, blue with room to spare. */
export const marginScale = scaleDiverging(interpolateRdYlBu).domain(MARGIN_DOMAIN).clamp(true);

/** Sequential map for matrix cells, t ∈ [0, 1]: light theme pale → dark red, dark theme dark → bright. */
export function cellInterpolator(dark: boolean): (t: number) => string {
  return dark ? (t) => interpolateInferno(0.08 + 0.9 * t) : (t) => interpolateYlOrRd(0.02 + 0.93 * t);
}

/** Relative luminance (WCAG) of a css colour, 0 … 1 (0.5 when it cannot be parsed). */
export function luminance(css: string): number {
  const c = color(css)?.rgb();
  if (!c) return 0.5;
  const lin = (v: number) => { const s = v / 255; return s <= 0.03928 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4; };
  return 0.2126 * lin(c.r) + 0.7152 * lin(c.g) + 0.0722 * lin(c.b);
}

/** Black or white text, whichever reads better on the given background. */
export function textOn(background: string): string {
  return luminance(background) > 0.22 ? '#111' : '#fff';
}
