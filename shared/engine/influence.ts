/**
 * Influence coefficients of uniform-flux rectangles on a flux channel (physics.md §1):
 * R_ji = Σ_m Σ_n W_mn f_m^(i) f_n^(i) f_m^(j) f_n^(j), W = ε_m ε_n Z_mn /(Lx Ly).
 * The truncation error falls as ~1/M² with M ∝ N (physics.md §1), so each sum is also taken over
 * the first half of the modes in the same pass and one Richardson step removes the leading error
 * term: R ≈ R_M + (R_M − R_M/2)/(r − 1), r = M·N/(M/2·N/2) (Richardson, Phil. Trans. A 210, 1911).
 * The table may be larger than the truncation used: rows have stride `table.n`.
 */

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

/**
 * Sum the pairs (i, j) listed in `pairs` (flat [i0, j0, i1, j1, …]); the half level (Richardson) is summed
 * in the same pass over each row of W.
 */
function pairSums(table: ModalTable, sp: Spectra, pairs: Int32Array, mode: SumMode): Float64Array {
  const { fx, fy, m: mm, n: nn } = sp;
  const { hm, hn, factor } = richardson(mm, nn);
  const count = pairs.length / 2;
  const w = table.w;
  const stride = table.n;
  const yprod = new Float64Array(nn);
  const out = new Float64Array(count);
  for (let k = 0; k < count; k++) {
    const xi = pairs[2 * k] * mm;
    const xj = pairs[2 * k + 1] * mm;
    const yi = pairs[2 * k] * nn;
    const yj = pairs[2 * k + 1] * nn;
    for (let q = 0; q < nn; q++) yprod[q] = fy[yi + q] * fy[yj + q];
    let full = 0;
    let half = 0;
    for (let p = 0; p < mm; p++) {
      const xp = fx[xi + p] * fx[xj + p];
      if (xp === 0) continue;
      const row = p * stride;
      let inner = 0;
      let q = 0;
      if (p < hm) {
        for (; q < hn; q++) inner += w[row + q] * yprod[q];
        half += xp * inner;
      }
      for (; q < nn; q++) inner += w[row + q] * yprod[q];
      full += xp * inner;
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
