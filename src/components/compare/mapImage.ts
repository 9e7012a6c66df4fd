/** Plane maps as images and differences between two maps on the same grid. */
import { rgb } from 'd3';
import type { MapResult } from '@shared/engine';

/** A grid of values in interposer coordinates (m), row 0 = lowest y; same layout as the engine's MapResult. */
export type Grid = Pick<MapResult, 'nx' | 'ny' | 'x0' | 'y0' | 'dx' | 'dy' | 'values'>;

/** Paint a grid into a PNG data URL with the highest y on top (screen order); null where there is no canvas (tests). */
export function gridToDataUrl(grid: Grid, colour: (v: number) => string): string | null {
  if (typeof document === 'undefined') return null;
  const canvas = document.createElement('canvas');
  canvas.width = grid.nx;
  canvas.height = grid.ny;
  const ctx = canvas.getContext?.('2d');
  if (!ctx) return null;
  const img = ctx.createImageData(grid.nx, grid.ny);
  for (let i = 0; i < grid.nx * grid.ny; i++) {
    const row = grid.ny - 1 - Math.floor(i / grid.nx);
    const c = rgb(colour(grid.values[row * grid.nx + (i % grid.nx)]));
    img.data[4 * i] = c.r;
    img.data[4 * i + 1] = c.g;
    img.data[4 * i + 2] = c.b;
    img.data[4 * i + 3] = 255;
  }
  ctx.putImageData(img, 0, 0);
  return canvas.toDataURL('image/png');
}

/** True when two grids cover the same cells (same size, origin and spacing within 1 nm). */
export function sameGrid(a: Grid, b: Grid): boolean {
  const eq = (x: number, y: number) => Math.abs(x - y) < 1e-9;
  return a.nx === b.nx && a.ny === b.ny && eq(a.x0, b.x0) && eq(a.y0, b.y0) && eq(a.dx, b.dx) && eq(a.dy, b.dy);
}

/** Cell-by-cell difference a − b (K) on a shared grid, or null when the grids differ. */
export function gridDifference(a: Grid, b: Grid): Grid | null {
  if (!sameGrid(a, b)) return null;
  return { ...a, values: a.values.map((v, i) => v - b.values[i]) };
}

/** Smallest and largest value of several grids (finite values only); null when there are none. */
export function gridRange(grids: Grid[]): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const g of grids) for (const v of g.values) if (Number.isFinite(v)) { if (v < lo) lo = v; if (v > hi) hi = v; }
  return lo <= hi ? [lo, hi] : null;
}
