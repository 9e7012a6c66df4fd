/**
 * Influence coefficients of uniform-flux rectangles on a flux channel (physics.md §1):
 * R_ji = Σ_m Σ_n W_mn f_m^(i) f_n^(i) f_m^(j) f_n^(j), W = ε_m ε_n Z_mn /(Lx Ly).
 * The truncation error falls as ~1/M² with M ∝ N (physics.md §1), so each sum is also taken over
 * the first half of the modes in the same pass and one Richardson step removes the leading error
 * term: R ≈ R_M + (R_M − R_M/2)/(r − 1), r = M·N/(M/2·N/2) (Richardson, Phil. Trans. A 210, 1911).
 * The table may be larger than the truncation used: rows have stride `table.n`.
 */
import { axisClasses } from './spectrumClasses';

/** A weighted modal table W (see impedance.ts) with its own size. */
export interface ModalTable {
  w: Float64Array;
  m: number;
  n: number;
}

/** Spectra along x and y, laid out [source·count + mode], with their mode counts. */
export interface Spectra {
  fx: Float64Array;
  fy: Float64Array;
  m: number;
  n: number;
  count: number;
}

/** How sums are finished: raw truncated sums, or with the Richardson step. */
export type SumMode = 'raw' | 'extrapolated';

/** Half-level mode counts and the Richardson factor 1/(r − 1) for a truncation m × n. */
export function richardson(m: number, n: number): { hm: number; hn: number; factor: number } {
  const hm = Math.max(1, Math.floor(m / 2));
  const hn = Math.max(1, Math.floor(n / 2));
  const r = (m * n) / (hm * hn);
  return { hm, hn, factor: r > 1 ? 1 / (r - 1) : 0 };
}

/** Class pairs summed together per pass over a row of W. */
const BLOCK = 8;

/**
 * Sum the pairs (i, j) listed in `pairs` (flat [i0, j0, i1, j1, …]) and, in the same pass, their half-level
 * sums (Richardson). Sources sharing centre and size along an axis share its spectrum, so the W-weighted
 * partial sums over the axis with fewer distinct spectra are formed once per pair of distinct spectra
 * (a row of parts on a grid costs one partial sum, not one per pair); the other axis then costs O(M) a pair.
 */
function pairSums(table: ModalTable, sp: Spectra, pairs: Int32Array, mode: SumMode): Float64Array {
  const { fx, fy, m: mm, n: nn } = sp;
  const { hm, hn, factor } = richardson(mm, nn);
  const w = table.w;
  const stride = table.n;
  const cx = axisClasses(fx, sp.count, mm);
  const cy = axisClasses(fy, sp.count, nn);
  const innerY = cy.reps.length <= cx.reps.length;
  const inner = innerY ? cy : cx;
  const classes = inner.reps.length;
  const count = pairs.length / 2;
  const pairClass = new Int32Array(count);
  const slot = new Map<number, number>();
  const classPairs: number[] = [];
  for (let k = 0; k < count; k++) {
    const a = inner.classOf[pairs[2 * k]];
    const b = inner.classOf[pairs[2 * k + 1]];
    const key = Math.min(a, b) * classes + Math.max(a, b);
    let s = slot.get(key);
    if (s === undefined) {
      s = classPairs.length / 2;
      slot.set(key, s);
      classPairs.push(inner.reps[a], inner.reps[b]);
    }
    pairClass[k] = s;
  }
  const kc = classPairs.length / 2;
  const outerLen = innerY ? mm : nn;
  const tFull = new Float64Array(kc * outerLen);
  const tHalf = new Float64Array(kc * outerLen);
  if (innerY) {
    // Class pairs in blocks of BLOCK: each row of W is read once per block while it sits in cache.
    const prod = new Float64Array(BLOCK * nn);
    for (let k0 = 0; k0 < kc; k0 += BLOCK) {
      const kb = Math.min(BLOCK, kc - k0);
      for (let b = 0; b < kb; b++) {
        const yi = classPairs[2 * (k0 + b)] * nn;
        const yj = classPairs[2 * (k0 + b) + 1] * nn;
        for (let q = 0; q < nn; q++) prod[b * nn + q] = fy[yi + q] * fy[yj + q];
      }
      for (let p = 0; p < mm; p++) {
        const row = p * stride;
        for (let b = 0; b < kb; b++) {
          const pb = b * nn;
          // Two accumulators halve the dependency chain of the dot product.
          let a0 = 0;
          let a1 = 0;
          let q = 0;
          for (; q + 1 < hn; q += 2) {
            a0 += w[row + q] * prod[pb + q];
            a1 += w[row + q + 1] * prod[pb + q + 1];
          }
          if (q < hn) a0 += w[row + q] * prod[pb + q++];
          tHalf[(k0 + b) * mm + p] = a0 + a1;
          for (; q + 1 < nn; q += 2) {
            a0 += w[row + q] * prod[pb + q];
            a1 += w[row + q + 1] * prod[pb + q + 1];
          }
          if (q < nn) a0 += w[row + q] * prod[pb + q];
          tFull[(k0 + b) * mm + p] = a0 + a1;
        }
      }
    }
  } else {
    const prod = new Float64Array(mm);
    for (let k = 0; k < kc; k++) {
      const xi = classPairs[2 * k] * mm;
      const xj = classPairs[2 * k + 1] * mm;
      for (let p = 0; p < mm; p++) prod[p] = fx[xi + p] * fx[xj + p];
      const base = k * nn;
      for (let p = 0; p < mm; p++) {
        if (p === hm) for (let q = 0; q < hn; q++) tHalf[base + q] = tFull[base + q];
        const c = prod[p];
        if (c === 0) continue;
        const row = p * stride;
        for (let q = 0; q < nn; q++) tFull[base + q] += c * w[row + q];
      }
      if (hm >= mm) for (let q = 0; q < hn; q++) tHalf[base + q] = tFull[base + q];
    }
  }
  const outer = innerY ? fx : fy;
  const halfLen = innerY ? hm : hn;
  const out = new Float64Array(count);
  for (let k = 0; k < count; k++) {
    const oi = pairs[2 * k] * outerLen;
    const oj = pairs[2 * k + 1] * outerLen;
    const t = pairClass[k] * outerLen;
    let full = 0;
    let half = 0;
    for (let p = 0; p < outerLen; p++) {
      const o = outer[oi + p] * outer[oj + p];
      if (p < halfLen) half += o * tHalf[t + p];
      full += o * tFull[t + p];
    }
    out[k] = mode === 'raw' ? full : full + (full - half) * factor;
  }
  return out;
}

/** Full symmetric influence matrix (K/W), row-major count × count: [j·count + i] = rise of j per W in i. */
export function influenceFromSpectra(table: ModalTable, sp: Spectra, mode: SumMode = 'extrapolated'): Float64Array {
  const count = sp.count;
  const pairs = new Int32Array(count * (count + 1));
  let k = 0;
  for (let i = 0; i < count; i++) {
    for (let j = i; j < count; j++) {
      pairs[k++] = i;
      pairs[k++] = j;
    }
  }
  const sums = pairSums(table, sp, pairs, mode);
  const out = new Float64Array(count * count);
  for (let p = 0; p < sums.length; p++) {
    const i = pairs[2 * p];
    const j = pairs[2 * p + 1];
    out[i * count + j] = sums[p];
    out[j * count + i] = sums[p];
  }
  return out;
}

/** Only the diagonal (self-resistances, K/W) — what the truncation check needs. */
export function selfInfluenceFromSpectra(table: ModalTable, sp: Spectra, mode: SumMode = 'extrapolated'): Float64Array {
  const pairs = new Int32Array(2 * sp.count);
  for (let i = 0; i < sp.count; i++) pairs[2 * i] = pairs[2 * i + 1] = i;
  return pairSums(table, sp, pairs, mode);
}
