/**
 * A part's own power-map non-uniformity at its junction face: a flux channel of the part's footprint
 * (die above to the rest of the up path, bumps below to the interposer plane, as face conductances),
 * sources = the map's cells. The (0,0) mode is dropped: uniform power adds nothing here, the network
 * already carries the mean. Separable spectrum F = Fxᵀ·(P·w)·Fy (cells lie on a grid).
 */
import type { PowerMap } from '../../schemas/model';
import type { ImpedanceCache } from '../cache';
import { fieldMap, sigmaFactors, type FieldMap } from '../field';
import { sinc } from '../spectrum';
import type { Channel } from '../types';

/** Rotate a power map (row 0 = lowest y) by the part's rotation, counter-clockwise. */
export function rotateMap(map: PowerMap, rotation: number): { nx: number; ny: number; w: Float64Array } {
  const { nx, ny, weights } = map;
  const swap = rotation === 90 || rotation === 270;
  const rx = swap ? ny : nx;
  const ry = swap ? nx : ny;
  const w = new Float64Array(rx * ry);
  for (let iy = 0; iy < ny; iy++) {
    for (let ix = 0; ix < nx; ix++) {
      let jx = ix;
      let jy = iy;
      if (rotation === 90) [jx, jy] = [ny - 1 - iy, ix];
      else if (rotation === 180) [jx, jy] = [nx - 1 - ix, ny - 1 - iy];
      else if (rotation === 270) [jx, jy] = [iy, nx - 1 - ix];
      w[jy * rx + jx] = weights[iy * nx + ix];
    }
  }
  return { nx: rx, ny: ry, w };
}

function cellSpectra(cells: number, length: number, modes: number): Float64Array {
  const out = new Float64Array(cells * modes);
  const a = length / cells;
  for (let c = 0; c < cells; c++) {
    const centre = (c + 0.5) * a;
    for (let m = 0; m < modes; m++) {
      const lam = (m * Math.PI) / length;
      out[c * modes + m] = Math.cos(lam * centre) * sinc((lam * a) / 2);
    }
  }
  return out;
}

/** Non-uniform part of the junction-face rise (K) for power P spread by the rotated map, on a gx × gy grid. */
export function powerMapField(
  channel: Channel,
  grid: { nx: number; ny: number; w: Float64Array },
  power: number,
  gx: number,
  gy: number,
  cache: ImpedanceCache,
): FieldMap {
  const m = Math.max(64, Math.min(256, 4 * grid.nx));
  const n = Math.max(64, Math.min(256, 4 * grid.ny));
  const modal = cache.table(channel, m, n);
  const table = modal.w;
  const stride = modal.n;
  const fx = cellSpectra(grid.nx, channel.lx, m);
  const fy = cellSpectra(grid.ny, channel.ly, n);
  let total = 0;
  for (const v of grid.w) total += v;
  const u = new Float64Array(grid.nx * n);
  for (let ix = 0; ix < grid.nx; ix++) {
    for (let iy = 0; iy < grid.ny; iy++) {
      const p = (power * grid.w[iy * grid.nx + ix]) / total;
      if (p === 0) continue;
      for (let b = 0; b < n; b++) u[ix * n + b] += p * fy[iy * n + b];
    }
  }
  const theta = new Float64Array(m * n);
  for (let ix = 0; ix < grid.nx; ix++) {
    for (let a = 0; a < m; a++) {
      const c = fx[ix * m + a];
      for (let b = 0; b < n; b++) theta[a * n + b] += c * u[ix * n + b];
    }
  }
  const sx = sigmaFactors(m);
  const sy = sigmaFactors(n);
  for (let a = 0; a < m; a++) for (let b = 0; b < n; b++) theta[a * n + b] *= table[a * stride + b] * sx[a] * sy[b];
  theta[0] = 0;
  return fieldMap(theta, m, n, channel.lx, channel.ly, gx, gy);
}
