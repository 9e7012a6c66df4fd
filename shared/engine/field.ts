/**
 * Temperature field of a flux channel (physics.md §1): modal temperatures θ_mn = W_mn·Σ_i P_i f^(i),
 * T(x, y) = Σ θ_mn cos(λ_m x) cos(δ_n y); a whole map is one inverse 2-D cosine transform. Point values
 * use Lanczos σ-factors sinc(πm/M)·sinc(πn/N) (Lanczos, Applied Analysis, 1956): the truncated sum then
 * has no Gibbs ringing at source edges and its error falls as ~1/M² instead of oscillating.
 */
import type { ChannelModes } from './channel';
import { CosineLine, foldedIndex } from './dct';
import { sinc } from './spectrum';

/** Lanczos σ-factors sinc(πk/count), k = 0 … count−1. */
export function sigmaFactors(count: number): Float64Array {
  const out = new Float64Array(count);
  for (let k = 0; k < count; k++) out[k] = sinc((Math.PI * k) / count);
  return out;
}

/** Modal temperatures (K) of the sources' powers (W) at the modes' truncation, σ-smoothed, layout [m·n + n]. */
export function modalTemperatures(modes: ChannelModes, powers: ArrayLike<number>, smooth = true): Float64Array {
  const { fx, fy, m, n, count } = modes.spectra;
  const theta = new Float64Array(m * n);
  for (let i = 0; i < count; i++) {
    const p = powers[i];
    if (p === 0) continue;
    for (let a = 0; a < m; a++) {
      const c = p * fx[i * m + a];
      if (c === 0) continue;
      const row = a * n;
      const yi = i * n;
      for (let b = 0; b < n; b++) theta[row + b] += c * fy[yi + b];
    }
  }
  const w = modes.table.w;
  const stride = modes.table.n;
  const sx = smooth ? sigmaFactors(m) : new Float64Array(m).fill(1);
  const sy = smooth ? sigmaFactors(n) : new Float64Array(n).fill(1);
  for (let a = 0; a < m; a++) for (let b = 0; b < n; b++) theta[a * n + b] *= w[a * stride + b] * sx[a] * sy[b];
  return theta;
}

/** A field sampled at cell centres of an nx × ny grid over the footprint; values[iy·nx + ix], row 0 = lowest y. */
export interface FieldMap {
  nx: number;
  ny: number;
  /** Cell size (m). Cell (ix, iy) is centred at ((ix + ½)·dx, (iy + ½)·dy). */
  dx: number;
  dy: number;
  values: Float64Array;
}

/** Sample Σ θ_mn cos(λ_m x) cos(δ_n y) at the cell centres (nx, ny powers of two) by folding + inverse DCT. */
export function fieldMap(theta: Float64Array, m: number, n: number, lx: number, ly: number, nx: number, ny: number): FieldMap {
  const bins = new Float64Array(nx * ny);
  const yBin = new Int32Array(n);
  const ySign = new Float64Array(n);
  for (let b = 0; b < n; b++) {
    const f = foldedIndex(b, ny);
    yBin[b] = f.bin;
    ySign[b] = f.sign;
  }
  for (let a = 0; a < m; a++) {
    const fa = foldedIndex(a, nx);
    if (fa.sign === 0) continue;
    const row = fa.bin * ny;
    for (let b = 0; b < n; b++) {
      if (ySign[b] !== 0) bins[row + yBin[b]] += fa.sign * ySign[b] * theta[a * n + b];
    }
  }
  const tmp = new Float64Array(nx * ny);
  const lineY = new CosineLine(ny);
  for (let bx = 0; bx < nx; bx++) lineY.evaluate(bins, bx * ny, 1, tmp, bx * ny, 1);
  const values = new Float64Array(nx * ny);
  const lineX = nx === ny ? lineY : new CosineLine(nx);
  for (let py = 0; py < ny; py++) lineX.evaluate(tmp, py, ny, values, py * nx, 1);
  return { nx, ny, dx: lx / nx, dy: ly / ny, values };
}

/** T at one point by the direct double sum (M·N operations). */
export function pointValue(theta: Float64Array, m: number, n: number, lx: number, ly: number, x: number, y: number): number {
  const cy = cosines(n, Math.PI / ly, y);
  let sum = 0;
  for (let a = 0; a < m; a++) {
    let inner = 0;
    const row = a * n;
    for (let b = 0; b < n; b++) inner += theta[row + b] * cy[b];
    sum += inner * Math.cos((a * Math.PI * x) / lx);
  }
  return sum;
}

/** cos(k·step·v) for k = 0 … count−1 by the Chebyshev recurrence (one cos, one sin call). */
export function cosines(count: number, step: number, v: number): Float64Array {
  const out = new Float64Array(count);
  if (count === 0) return out;
  out[0] = 1;
  if (count === 1) return out;
  const c1 = Math.cos(step * v);
  out[1] = c1;
  for (let k = 2; k < count; k++) out[k] = 2 * c1 * out[k - 1] - out[k - 2];
  return out;
}

/** Smallest power of two ≥ v (at least 2). */
export function nextPow2(v: number): number {
  let p = 2;
  while (p < v) p *= 2;
  return p;
}
