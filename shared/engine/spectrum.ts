/**
 * Cosine spectra of uniform-flux rectangles (physics.md §1; Muzychka, Culham & Yovanovich,
 * J. Electronic Packaging 125, 2003): f_m = cos(λ_m x_c)·sinc(λ_m a/2), the mean of cos(λ_m x) over
 * the source's width a.
 */
import type { RectSource } from './types';

/** sin(u)/u with the limit 1 at u = 0. */
export function sinc(u: number): number {
  return u === 0 ? 1 : Math.sin(u) / u;
}

/** Spectra of all sources along one axis, laid out [source·count + m]; `axis` picks x/width or y/height. */
export function axisSpectra(sources: readonly RectSource[], length: number, count: number, axis: 'x' | 'y'): Float64Array {
  const out = new Float64Array(sources.length * count);
  const step = Math.PI / length;
  for (let i = 0; i < sources.length; i++) {
    const src = sources[i];
    const centre = axis === 'x' ? src.x : src.y;
    const half = (axis === 'x' ? src.width : src.height) / 2;
    const base = i * count;
    for (let m = 0; m < count; m++) {
      const lam = m * step;
      out[base + m] = Math.cos(lam * centre) * sinc(lam * half);
    }
  }
  return out;
}
